/**
 * `npm start` as a person meets it: a few lines (where the app is, who can
 * sign in, where the mail goes, how to stop), the build's own output kept
 * back, and the app served on this machine only unless HOST says otherwise.
 *
 * Runs scripts/start.ts on its own database (the test database's name +
 * "_start"), its own ports (TEST_PORT + 60 … + 62) and its own build folder,
 * so it never meets the test app or a developer's `npm start`.
 */
import { spawn, type ChildProcess } from "node:child_process";
import os from "node:os";
import path from "node:path";
import { afterAll, describe, expect, inject, it } from "vitest";
import { demoPassword } from "../../seed/demo-people";
import { closeTestDatabase, testDatabase } from "../support/test-database";

const projectRoot = path.resolve(import.meta.dirname, "..", "..");
const testPort = Number(process.env.TEST_PORT ?? 3100);
const appPort = testPort + 60;
const mailSmtpPort = testPort + 61;
const mailHttpPort = testPort + 62;

const testDatabaseUrl = new URL(inject("databaseUrl"));
const startDatabase = `${testDatabaseUrl.pathname.slice(1)}_start`;
const startDatabaseUrl = new URL(testDatabaseUrl);
startDatabaseUrl.pathname = `/${startDatabase}`;

let start: ChildProcess | undefined;

async function stopStart(): Promise<void> {
  const child = start;
  if (!child || child.exitCode !== null || child.signalCode !== null) return;
  const exited = new Promise((resolve) => child.once("exit", resolve));
  child.kill("SIGINT");
  const timer = setTimeout(() => {
    // The whole group (the start script and the server it started) if it hangs.
    if (child.pid) process.kill(-child.pid, "SIGKILL");
  }, 10_000);
  await exited;
  clearTimeout(timer);
}

afterAll(async () => {
  await stopStart();
  await testDatabase().query(`DROP DATABASE IF EXISTS \`${startDatabase}\``);
  await closeTestDatabase();
});

/** Whether anything answers HTTP at this address and port. */
async function answers(host: string, port: number): Promise<boolean> {
  const hostInUrl = host.includes(":") ? `[${host}]` : host;
  try {
    const response = await fetch(`http://${hostInUrl}:${port}/healthz`, {
      signal: AbortSignal.timeout(3_000),
    });
    return response.status > 0;
  } catch {
    return false;
  }
}

/** This machine's addresses other than loopback (and other than IPv6 link-local, which needs a zone). */
function outwardAddresses(): string[] {
  return Object.values(os.networkInterfaces())
    .flat()
    .filter((entry) => entry !== undefined)
    .filter((entry) => !entry.internal)
    .filter((entry) => !(entry.family === "IPv6" && entry.scopeid !== 0))
    .map((entry) => entry.address);
}

describe("npm start", () => {
  it("says in a few lines where the app is, who can sign in, where the mail goes and how to stop; it listens on loopback only", async (context) => {
    await testDatabase().query(`DROP DATABASE IF EXISTS \`${startDatabase}\``);
    await testDatabase().query(`CREATE DATABASE \`${startDatabase}\``);

    let output = "";
    start = spawn(
      path.join(projectRoot, "node_modules", ".bin", "tsx"),
      [path.join(projectRoot, "scripts", "start.ts"), "--demo"],
      {
        cwd: projectRoot,
        detached: true,
        stdio: ["ignore", "pipe", "pipe"],
        env: {
          ...process.env,
          DATABASE_URL: startDatabaseUrl.toString(),
          PORT: String(appPort),
          MAIL_FAKE_SMTP_PORT: String(mailSmtpPort),
          MAIL_FAKE_HTTP_PORT: String(mailHttpPort),
          BUILD_DIRECTORY: `${process.env.BUILD_DIRECTORY ?? "build"}-start`,
          HOST: undefined,
          SMTP_URL: undefined,
          APP_URL: undefined,
          DEMO_DATA: undefined,
          NODE_ENV: undefined,
          // What a terminal gets: no colour codes in what is compared.
          NO_COLOR: "1",
        },
      },
    );
    start.stdout!.on("data", (chunk: Buffer) => (output += chunk));
    start.stderr!.on("data", (chunk: Buffer) => (output += chunk));

    const started = Date.now();
    while (!output.includes("Ctrl+C") && start.exitCode === null) {
      if (Date.now() - started > 240_000)
        throw new Error(`npm start did not finish starting:\n${output}`);
      await new Promise((resolve) => setTimeout(resolve, 250));
    }
    expect(start.exitCode, output).toBeNull();
    // Anything printed just after the last line.
    await new Promise((resolve) => setTimeout(resolve, 1_000));

    const lines = output.trimEnd().split("\n");
    expect(lines.length, output).toBeLessThanOrEqual(12);
    expect(output).toContain(`http://localhost:${appPort}`);
    expect(output).toContain("admin@turnledger.test");
    expect(output).toContain(demoPassword());
    expect(output).toContain(`http://127.0.0.1:${mailHttpPort}`);
    expect(output).toContain("Ctrl+C");
    // Kept back: the build's file list and warnings, the seed's e-mails.
    expect(output).not.toMatch(/envFile|Future Flag|\.js\s+\d|\[mail fake\]/);

    expect(await answers("127.0.0.1", appPort)).toBe(true);
    const outward = outwardAddresses();
    if (outward.length === 0) {
      context.skip(
        "this machine has no network address besides loopback to try",
      );
      return;
    }
    for (const address of outward)
      expect(await answers(address, appPort), address).toBe(false);

    await stopStart();
    expect(output).toContain("stopped");
  }, 300_000);
});
