/**
 * The browser's files compressed once, when the app is built: beside each
 * text file of the client build a brotli copy (name.js.br) and a gzip copy
 * (name.js.gz), which server.js sends as they are to a browser that accepts
 * them (express-static-gzip). No request compresses an asset again.
 * See docs/decisions/051-precompressed-assets-and-page-weight.md.
 */
import fs from "node:fs/promises";
import path from "node:path";
import { promisify } from "node:util";
import zlib from "node:zlib";
import type { Plugin } from "vite";

/**
 * The files worth compressing: scripts, styles, SVG, JSON, text. Fonts are
 * left as they are: woff2 is brotli inside already, woff is zlib.
 */
export const compressibleFile = /\.(js|mjs|css|svg|json|html|txt|map)$/;

/** The copies written beside each file, best first (server.js prefers them in this order). */
export const precompressedEncodings = [
  {
    encoding: "br",
    extension: ".br",
    compress: (content: Buffer) =>
      promisify(zlib.brotliCompress)(content, {
        params: {
          [zlib.constants.BROTLI_PARAM_QUALITY]:
            zlib.constants.BROTLI_MAX_QUALITY,
          [zlib.constants.BROTLI_PARAM_SIZE_HINT]: content.length,
        },
      }),
  },
  {
    encoding: "gzip",
    extension: ".gz",
    compress: (content: Buffer) =>
      promisify(zlib.gzip)(content, {
        level: zlib.constants.Z_BEST_COMPRESSION,
      }),
  },
] as const;

async function filesUnder(folder: string): Promise<string[]> {
  const entries = await fs.readdir(folder, {
    recursive: true,
    withFileTypes: true,
  });
  return entries
    .filter((entry) => entry.isFile())
    .map((entry) => path.join(entry.parentPath, entry.name));
}

/** What {@link precompressFolder} wrote: one row per copy. */
export interface PrecompressedCopy {
  file: string;
  encoding: string;
  bytes: number;
}

/**
 * Writes the brotli and gzip copies of every {@link compressibleFile} under
 * `folder`. A copy that would be no smaller than its file is not written (the
 * file then goes out as it is); copies left from an earlier build are replaced.
 */
export async function precompressFolder(
  folder: string,
): Promise<PrecompressedCopy[]> {
  const files = (await filesUnder(folder)).filter((file) =>
    compressibleFile.test(file),
  );
  const written: PrecompressedCopy[] = [];
  await Promise.all(
    files.map(async (file) => {
      const content = await fs.readFile(file);
      for (const { encoding, extension, compress } of precompressedEncodings) {
        const copy = await compress(content);
        const copyFile = `${file}${extension}`;
        if (copy.length >= content.length) {
          await fs.rm(copyFile, { force: true });
          continue;
        }
        await fs.writeFile(copyFile, copy);
        written.push({ file: copyFile, encoding, bytes: copy.length });
      }
    }),
  );
  return written;
}

/**
 * The Vite plugin for the server build, the last step of `react-router
 * build`: when it is done, compresses the client folder. Not sooner: React Router writes its
 * route manifest (assets/manifest-*.js, on every page) and moves the
 * server-only styles into the client folder while the server build runs.
 */
export function precompressClientBuild(clientFolder: string): Plugin {
  return {
    name: "turnledger:precompress-client-build",
    apply: "build",
    async closeBundle() {
      await precompressFolder(clientFolder);
    },
  };
}
