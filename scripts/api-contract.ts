/**
 * npm run api:contract — writes the API's contract to docs/api/openapi.json and the typed
 * client's types (openapi-typescript) to app/api-client/schema.d.ts. The tests fail while
 * either is out of step with the code.
 */
import fs from "node:fs";
import { contractFile, contractText } from "~/api-contract/contract-file";
import { apiTypesFile, apiTypesText } from "./lib/api-types";

fs.mkdirSync(new URL("../docs/api/", import.meta.url), { recursive: true });
fs.writeFileSync(contractFile, contractText());
console.log(`[turnledger] wrote ${contractFile}`);
fs.writeFileSync(apiTypesFile, await apiTypesText());
console.log(`[turnledger] wrote ${apiTypesFile}`);
