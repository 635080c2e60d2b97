/**
 * The typed client's types (app/api-client/schema.d.ts), generated from the API's contract
 * with openapi-typescript's Node API. `npm run api:contract` writes them; a unit test
 * (app/api-client/schema.test.ts) fails while the committed file is out of step.
 */
import path from "node:path";
import openapiTS, { astToString, COMMENT_HEADER } from "openapi-typescript";
import { apiDocument } from "~/api-contract/document";

export const apiTypesFile = path.resolve(
  import.meta.dirname,
  "..",
  "..",
  "app",
  "api-client",
  "schema.d.ts",
);

/** The generated TypeScript declarations of the contract's paths, operations and schemas. */
export async function apiTypesText(): Promise<string> {
  // A copy: the generator must not see (or change) the document the app serves.
  const document = JSON.parse(JSON.stringify(apiDocument()));
  const nodes = await openapiTS(document, { silent: true });
  return `${COMMENT_HEADER.trimEnd()}\n/* Generated from the API contract (docs/api/openapi.json) by npm run api:contract. */\n\n${astToString(nodes)}`;
}
