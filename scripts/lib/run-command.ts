import { spawn, spawnSync, type SpawnOptions } from "node:child_process";

/** Runs a command to completion, its output shown; throws when it fails. */
export function runCommand(
  command: string,
  args: string[],
  options: SpawnOptions = {},
): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn(command, args, { stdio: "inherit", ...options });
    child.on("error", reject);
    child.on("exit", (code, signal) => {
      if (code === 0) resolve();
      else
        reject(
          new Error(
            `${command} ${args.join(" ")} failed (${signal ?? `exit ${code}`})`,
          ),
        );
    });
  });
}

/**
 * Runs a command to completion with its output kept back (a build's hundreds
 * of file sizes); throws when it fails, with that output in the error, so the
 * reason is shown only when there is one.
 */
export function runCommandQuietly(
  command: string,
  args: string[],
  options: SpawnOptions = {},
): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn(command, args, {
      ...options,
      stdio: ["ignore", "pipe", "pipe"],
    });
    let output = "";
    child.stdout?.on("data", (chunk: Buffer) => (output += chunk));
    child.stderr?.on("data", (chunk: Buffer) => (output += chunk));
    child.on("error", reject);
    child.on("exit", (code, signal) => {
      if (code === 0) resolve();
      else
        reject(
          new Error(
            `${command} ${args.join(" ")} failed (${signal ?? `exit ${code}`}). Its output:\n${output.trimEnd()}`,
          ),
        );
    });
  });
}

/** The absolute path of a program on PATH (or in the sbin folders), or null. */
export function findProgram(name: string): string | null {
  const searchPath = [
    process.env.PATH ?? "",
    "/usr/local/sbin",
    "/usr/sbin",
    "/sbin",
  ].join(":");
  const result = spawnSync("sh", ["-c", `command -v ${name}`], {
    env: { ...process.env, PATH: searchPath },
    encoding: "utf8",
  });
  const found = result.stdout.trim();
  return result.status === 0 && found ? found : null;
}

export function isRoot(): boolean {
  return typeof process.getuid === "function" && process.getuid() === 0;
}

/** Installs Debian packages with apt-get; only root may do it. */
export async function installDebianPackages(
  packages: string[],
  why: string,
): Promise<void> {
  if (!isRoot()) {
    throw new Error(
      `${why} Install it first, as root: apt-get install -y ${packages.join(" ")}`,
    );
  }
  console.log(`[turnledger] installing ${packages.join(", ")} from Debian…`);
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  await runCommand("apt-get", ["update", "-qq"], { env });
  await runCommand("apt-get", ["install", "-y", "-qq", ...packages], { env });
}
