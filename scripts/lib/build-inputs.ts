/**
 * Whether the tests may reuse the production build they find: a SHA-256 of
 * everything `react-router build` reads (the build's inputs) is kept beside
 * the build and compared with the inputs of today. Test files are left out:
 * no build imports them, so changing a test never rebuilds the app.
 */
import { createHash } from "node:crypto";
import fs from "node:fs";
import path from "node:path";

/** Folders whose every file (tests aside) goes into the build. */
export const buildInputFolders = ["app", "server", "drizzle", "public"];

/** Single files the build reads or is configured by. */
export const buildInputFiles = [
  "server.js",
  "package.json",
  "package-lock.json",
  "vite.config.ts",
  "react-router.config.ts",
  "tsconfig.json",
];

/** Settings read while building: where it goes, and what Vite puts in the browser's code. */
export function buildEnvironment(
  env: NodeJS.ProcessEnv,
): Record<string, string> {
  const chosen: Record<string, string> = {
    BUILD_DIRECTORY: env.BUILD_DIRECTORY ?? "build",
  };
  for (const [name, value] of Object.entries(env))
    if (name.startsWith("VITE_") && value !== undefined) chosen[name] = value;
  return chosen;
}

function isTestFile(relative: string): boolean {
  return /\.test\.[cm]?[jt]sx?$/.test(relative);
}

function filesUnder(root: string, folder: string): string[] {
  const start = path.join(root, folder);
  if (!fs.existsSync(start)) return [];
  return fs
    .readdirSync(start, { recursive: true, withFileTypes: true })
    .filter((entry) => entry.isFile())
    .map((entry) =>
      path
        .relative(root, path.join(entry.parentPath, entry.name))
        .split(path.sep)
        .join("/"),
    )
    .filter((relative) => !isTestFile(relative));
}

/** The SHA-256 (hex) of the build's inputs under `root` and the build settings in `env`. */
export function buildInputsHash(root: string, env: NodeJS.ProcessEnv): string {
  const files = [
    ...buildInputFolders.flatMap((folder) => filesUnder(root, folder)),
    ...buildInputFiles.filter((file) => fs.existsSync(path.join(root, file))),
  ].sort();
  const hash = createHash("sha256");
  hash.update(JSON.stringify(buildEnvironment(env)));
  for (const file of files) {
    const content = createHash("sha256")
      .update(fs.readFileSync(path.join(root, file)))
      .digest("hex");
    hash.update(`\n${file}\0${content}`);
  }
  return hash.digest("hex");
}

/** The file beside the build that holds its stamp (buildStamp). */
export function buildStampFile(buildDirectory: string): string {
  return path.join(buildDirectory, "inputs.sha256");
}

/** The server bundle whose presence means there is a build. */
export function builtServerFile(buildDirectory: string): string {
  return path.join(buildDirectory, "server", "index.js");
}

/**
 * What identifies a build made from these inputs: their hash and the time the
 * server bundle was written. A build made by something else (`npm start`
 * building into the same folder) rewrites the bundle, so its stamp no longer
 * matches even when the sources are back as they were.
 */
export function buildStamp(inputsHash: string, buildDirectory: string): string {
  const written = fs.statSync(builtServerFile(buildDirectory)).mtimeMs;
  return `${inputsHash} ${written}`;
}

export type BuildDecision =
  | { build: false; reason: "TEST_SKIP_BUILD=1" | "inputs unchanged" }
  | {
      build: true;
      reason: "no build" | "no record of its inputs" | "inputs changed";
    };

/** Build again, or serve the build there is. */
export function decideBuild(facts: {
  skipBuild: boolean;
  buildExists: boolean;
  /** The stamp kept beside the build, null when there is none. */
  storedStamp: string | null;
  /** buildStamp of today's inputs and the build there is. */
  currentStamp: string | null;
}): BuildDecision {
  if (facts.skipBuild) return { build: false, reason: "TEST_SKIP_BUILD=1" };
  if (!facts.buildExists || facts.currentStamp === null)
    return { build: true, reason: "no build" };
  if (facts.storedStamp === null)
    return { build: true, reason: "no record of its inputs" };
  if (facts.storedStamp !== facts.currentStamp)
    return { build: true, reason: "inputs changed" };
  return { build: false, reason: "inputs unchanged" };
}
