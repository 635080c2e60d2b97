import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterEach, beforeEach, describe, expect, it } from "vitest";
import {
  buildEnvironment,
  buildInputsHash,
  buildStamp,
  builtServerFile,
  decideBuild,
} from "./build-inputs";

let root = "";
const write = (file: string, text: string) => {
  const full = path.join(root, file);
  fs.mkdirSync(path.dirname(full), { recursive: true });
  fs.writeFileSync(full, text);
};

beforeEach(() => {
  root = fs.mkdtempSync(path.join(os.tmpdir(), "build-inputs-"));
  write("app/root.tsx", "export default function Root() {}\n");
  write("app/lib/format.ts", "export const a = 1;\n");
  write("server/app.ts", "export {};\n");
  write("drizzle/0000_first.sql", "CREATE TABLE t (id int);\n");
  write("package-lock.json", "{}\n");
  write("vite.config.ts", "export default {};\n");
});
afterEach(() => {
  fs.rmSync(root, { recursive: true, force: true });
});

describe("buildInputsHash", () => {
  const env = { BUILD_DIRECTORY: "build-mine" };

  it("is the same for the same files and settings", () => {
    expect(buildInputsHash(root, env)).toBe(buildInputsHash(root, { ...env }));
  });

  it("changes when a source file changes, is added or is renamed", () => {
    const before = buildInputsHash(root, env);
    write("app/lib/format.ts", "export const a = 2;\n");
    const edited = buildInputsHash(root, env);
    expect(edited).not.toBe(before);
    write("server/extra.ts", "export {};\n");
    const added = buildInputsHash(root, env);
    expect(added).not.toBe(edited);
    fs.renameSync(
      path.join(root, "server/extra.ts"),
      path.join(root, "server/other.ts"),
    );
    expect(buildInputsHash(root, env)).not.toBe(added);
  });

  it("changes with the lock file, a migration, the Vite config and the build folder", () => {
    const before = buildInputsHash(root, env);
    write("package-lock.json", '{"lockfileVersion":3}\n');
    const locked = buildInputsHash(root, env);
    expect(locked).not.toBe(before);
    write("drizzle/0001_second.sql", "ALTER TABLE t ADD c int;\n");
    const migrated = buildInputsHash(root, env);
    expect(migrated).not.toBe(locked);
    write("vite.config.ts", "export default { base: '/' };\n");
    const configured = buildInputsHash(root, env);
    expect(configured).not.toBe(migrated);
    expect(buildInputsHash(root, { BUILD_DIRECTORY: "build-other" })).not.toBe(
      configured,
    );
  });

  it("ignores test files and files outside the build's inputs", () => {
    const before = buildInputsHash(root, env);
    write("app/lib/format.test.ts", "it('x', () => {});\n");
    write("tests/integration/sign-in.test.ts", "it('x', () => {});\n");
    write("docs/decisions/001-x.md", "# x\n");
    expect(buildInputsHash(root, env)).toBe(before);
  });
});

describe("buildEnvironment", () => {
  it("takes the build folder (build by default) and VITE_ settings only", () => {
    expect(
      buildEnvironment({ VITE_FLAG: "1", TEST_PORT: "3100", HOME: "/root" }),
    ).toEqual({ BUILD_DIRECTORY: "build", VITE_FLAG: "1" });
  });
});

describe("buildStamp", () => {
  it("changes when the server bundle is written again", () => {
    write("build/server/index.js", "one\n");
    const buildDirectory = path.join(root, "build");
    const first = buildStamp("abc", buildDirectory);
    expect(first.startsWith("abc ")).toBe(true);
    const later = new Date(Date.now() + 5_000);
    fs.utimesSync(builtServerFile(buildDirectory), later, later);
    expect(buildStamp("abc", buildDirectory)).not.toBe(first);
  });
});

describe("decideBuild", () => {
  const stamp = "abc 1700000000000";

  it("serves the build when its stamp matches today's inputs", () => {
    expect(
      decideBuild({
        skipBuild: false,
        buildExists: true,
        storedStamp: stamp,
        currentStamp: stamp,
      }),
    ).toEqual({ build: false, reason: "inputs unchanged" });
  });

  it("builds when the inputs changed", () => {
    expect(
      decideBuild({
        skipBuild: false,
        buildExists: true,
        storedStamp: stamp,
        currentStamp: "abd 1700000000000",
      }),
    ).toEqual({ build: true, reason: "inputs changed" });
  });

  it("builds when there is no stamp or no build", () => {
    expect(
      decideBuild({
        skipBuild: false,
        buildExists: true,
        storedStamp: null,
        currentStamp: stamp,
      }),
    ).toEqual({ build: true, reason: "no record of its inputs" });
    expect(
      decideBuild({
        skipBuild: false,
        buildExists: false,
        storedStamp: stamp,
        currentStamp: null,
      }),
    ).toEqual({ build: true, reason: "no build" });
  });

  it("never builds with TEST_SKIP_BUILD=1, changed or not", () => {
    expect(
      decideBuild({
        skipBuild: true,
        buildExists: true,
        storedStamp: stamp,
        currentStamp: "other 1",
      }),
    ).toEqual({ build: false, reason: "TEST_SKIP_BUILD=1" });
  });
});
