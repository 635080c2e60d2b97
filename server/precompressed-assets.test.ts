import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import zlib from "node:zlib";
import { afterEach, beforeEach, expect, it } from "vitest";
import { precompressFolder } from "./precompressed-assets";

let folder = "";
beforeEach(() => {
  folder = fs.mkdtempSync(path.join(os.tmpdir(), "precompress-"));
  fs.mkdirSync(path.join(folder, "assets"));
});
afterEach(() => fs.rmSync(folder, { recursive: true, force: true }));

const script = "export const coils = [" + "1.25, ".repeat(2000) + "];\n";

it("writes brotli and gzip copies that decompress to the file, in every folder below", async () => {
  fs.writeFileSync(path.join(folder, "assets", "entry.js"), script);
  const written = await precompressFolder(folder);
  expect(written.map((copy) => path.basename(copy.file)).sort()).toEqual([
    "entry.js.br",
    "entry.js.gz",
  ]);
  const original = fs.readFileSync(path.join(folder, "assets", "entry.js"));
  const brotli = fs.readFileSync(path.join(folder, "assets", "entry.js.br"));
  const gzip = fs.readFileSync(path.join(folder, "assets", "entry.js.gz"));
  expect(zlib.brotliDecompressSync(brotli).equals(original)).toBe(true);
  expect(zlib.gunzipSync(gzip).equals(original)).toBe(true);
  expect(brotli.length).toBeLessThan(original.length / 10);
});

it("leaves fonts alone and writes no copy that is not smaller than its file", async () => {
  fs.writeFileSync(path.join(folder, "assets", "font.woff2"), script);
  fs.writeFileSync(path.join(folder, "dot.svg"), "<svg/>");
  // A copy left by an earlier build of a file that no longer compresses.
  fs.writeFileSync(path.join(folder, "dot.svg.gz"), "stale");
  expect(await precompressFolder(folder)).toEqual([]);
  expect(fs.readdirSync(folder, { recursive: true }).sort()).toEqual([
    "assets",
    "assets/font.woff2",
    "dot.svg",
  ]);
});
