/** docs/api/openapi.json: the contract as a file, for generating clients without a server. */
import path from "node:path";
import { apiDocument } from "./document";

export const contractFile = path.resolve(
  import.meta.dirname,
  "..",
  "..",
  "docs",
  "api",
  "openapi.json",
);

/** The document as written to the file: two-space JSON and a final newline. */
export function contractText(): string {
  return `${JSON.stringify(apiDocument(), null, 2)}\n`;
}
