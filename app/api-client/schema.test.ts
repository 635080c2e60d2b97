/**
 * The typed client's types (./schema.d.ts) are those openapi-typescript makes from the
 * contract today: `npm run api:contract` rewrites them after a change to the API.
 */
import fs from "node:fs";
import { describe, expect, it } from "vitest";
import { apiDocument } from "~/api-contract/document";
import { apiTypesFile, apiTypesText } from "../../scripts/lib/api-types";

describe("the typed client's types", () => {
  it("are generated from the current contract (npm run api:contract writes them)", async () => {
    const committed = fs.readFileSync(apiTypesFile, "utf8");
    expect(
      committed === (await apiTypesText()),
      "run npm run api:contract",
    ).toBe(true);
  });

  it("describe every operation of the contract", async () => {
    const text = await apiTypesText();
    const operationIds = Object.values(apiDocument().paths ?? {}).flatMap(
      (pathItem) =>
        Object.values(pathItem ?? {}).flatMap((operation) =>
          operation &&
          typeof operation === "object" &&
          "operationId" in operation
            ? [String(operation.operationId)]
            : [],
        ),
    );
    expect(operationIds).toContain("estimateCoil");
    for (const operationId of operationIds)
      expect(text).toContain(`operations["${operationId}"]`);
  });
});
