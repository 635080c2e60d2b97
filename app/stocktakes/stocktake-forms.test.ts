import { parseForm } from "~/lib/parse-form";
import { describe, expect, it } from "vitest";
import { countFormSchema, skuList, startFormSchema } from "./stocktake-forms";

/** A refused submission's messages by field; undefined when it was accepted. */
const errorsOf = (submission: {
  status?: string;
  error?: Record<string, string[] | null> | null;
}) => (submission.status === "error" ? (submission.error ?? {}) : undefined);

const form = (entries: [string, string][]) => {
  const data = new FormData();
  for (const [name, value] of entries) data.append(name, value);
  return data;
};

describe("startFormSchema", () => {
  it("takes ticked locations", () => {
    const submission = parseForm(
      form([
        ["intent", "start"],
        ["locations", "A1"],
        ["locations", "B2"],
      ]),
      { schema: startFormSchema },
    );
    expect(submission.status).toBe("success");
    if (submission.status === "success")
      expect(submission.value).toMatchObject({
        locations: ["A1", "B2"],
        skus: [],
        note: "",
      });
  });
  it("asks for locations or SKUs, never both", () => {
    const none = parseForm(form([["intent", "start"]]), {
      schema: startFormSchema,
    });
    expect(errorsOf(none)?.locations?.[0]).toContain("at least one location");
    const both = parseForm(
      form([
        ["intent", "start"],
        ["locations", "A1"],
        ["skus", "CU-1"],
      ]),
      { schema: startFormSchema },
    );
    expect(errorsOf(both)?.skus?.[0]).toContain("not both");
  });
});

describe("skuList", () => {
  it("splits on commas, spaces and new lines and drops repeats", () => {
    expect(skuList("CU-1, MG-2\nCU-1  PT-3;")).toEqual([
      "CU-1",
      "MG-2",
      "PT-3",
    ]);
    expect(skuList(undefined)).toEqual([]);
  });
});

describe("countFormSchema", () => {
  const parse = (entries: [string, string][]) =>
    parseForm(form([["intent", "count"], ["lineId", "7"], ...entries]), {
      schema: countFormSchema,
    });
  it("reads a quantity with a decimal comma into thousandths", () => {
    const submission = parse([["quantity", "10,7"]]);
    expect(submission.status === "success" && submission.value.quantity).toBe(
      10_700n,
    );
  });
  it("accepts 0 (an empty place) but not a negative count", () => {
    expect(parse([["quantity", "0"]]).status).toBe("success");
    expect(errorsOf(parse([["quantity", "-1"]]))?.quantity?.[0]).toContain(
      "cannot be negative",
    );
  });
  it("takes a gross weight with a tare; a tare alone is left unused", () => {
    const weighed = parse([
      ["grossKg", "11.3"],
      ["tareKg", "0.6"],
    ]);
    expect(
      weighed.status === "success" && [
        weighed.value.grossKg,
        weighed.value.tareKg,
      ],
    ).toEqual([11_300n, 600n]);
    const tareOnly = parse([
      ["quantity", "2"],
      ["tareKg", "0.6"],
    ]);
    expect(
      tareOnly.status === "success" && tareOnly.value.tareKg,
    ).toBeUndefined();
  });
  it("asks for the count, and refuses a quantity and a gross weight together", () => {
    expect(errorsOf(parse([]))?.quantity?.[0]).toContain(
      "Give the quantity counted",
    );
    expect(
      errorsOf(
        parse([
          ["quantity", "2"],
          ["grossKg", "3"],
        ]),
      )?.grossKg?.[0],
    ).toContain("not both");
    expect(errorsOf(parse([["quantity", "1.2345"]]))?.quantity?.[0]).toContain(
      "3 decimals",
    );
  });
});
