import path from "node:path";
import { fileURLToPath } from "node:url";

/** The checkout's root folder, whatever the working directory. */
export const projectRoot = path.resolve(
  path.dirname(fileURLToPath(import.meta.url)),
  "..",
  "..",
);

/** Everything the project keeps at run time (git-ignored). */
export const dataRoot = path.join(projectRoot, ".data");
