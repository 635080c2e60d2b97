/**
 * The designs group's examples (the demo's answers, ./../schemas/design-examples.ts) match
 * the schemas they illustrate in the built document, so a reader of the contract never
 * sees an example the API could not give.
 */
import { Ajv2020 } from "ajv/dist/2020.js";
import addFormats from "ajv-formats";
import { describe, expect, it } from "vitest";
import { apiDocument } from "../document";

const named = [
  "DesignSummary",
  "DesignList",
  "CreatedDesign",
  "Design",
  "StartedRevision",
  "ReleasedRevision",
  "DesignRevision",
  "CostSplit",
  "MotorConstants",
  "WindingFigures",
  "TorqueEstimate",
  "DesignCosting",
  "WireSubstitutes",
  "DesignInsight",
  "DesignInsightList",
  "StockValue",
];

describe("the designs group's examples", () => {
  const schemas = apiDocument().components?.schemas ?? {};
  const ajv = new Ajv2020({ strict: false, allErrors: true });
  addFormats.default(ajv);

  it.each(named)("%s has an example that matches it", (id) => {
    const schema = schemas[id] as { example?: unknown } | undefined;
    expect(schema?.example).toBeDefined();
    const validate = ajv.compile({
      ...schema,
      components: { schemas },
    });
    expect(validate(schema!.example), JSON.stringify(validate.errors)).toBe(
      true,
    );
  });
});
