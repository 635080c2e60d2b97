import { parseForm } from "~/lib/parse-form";
import { describe, expect, it } from "vitest";
import {
  buildOrderCreateSchema,
  createFormSchema,
  issueFormSchema,
  issueRequestSchema,
  reserveFormSchema,
} from "./build-order-forms";

function form(fields: Record<string, string>): FormData {
  const data = new FormData();
  for (const [name, value] of Object.entries(fields)) data.append(name, value);
  return data;
}

describe("the API bodies", () => {
  it("refuses a build of 0 motors and a fraction of a motor, field by field", () => {
    const zero = buildOrderCreateSchema.safeParse({
      designId: 1,
      revision: 1,
      quantity: 0,
    });
    expect(zero.success).toBe(false);
    expect(zero.error!.issues[0]).toMatchObject({
      path: ["quantity"],
      message: "The number of motors must be at least 1.",
    });
    const fraction = buildOrderCreateSchema.safeParse({
      designId: 1,
      revision: 1,
      quantity: 2.5,
    });
    expect(fraction.error!.issues[0]!.path).toEqual(["quantity"]);
  });

  it("takes an issue by quantity or by gross weight, not both and not neither", () => {
    expect(
      issueRequestSchema.parse({ sku: "CU", location: "A", quantity: 1.25 })
        .quantity,
    ).toBe(1_250n);
    expect(
      issueRequestSchema.parse({ sku: "CU", location: "A", grossKg: 4.15 })
        .grossKg,
    ).toBe(4_150n);
    const neither = issueRequestSchema.safeParse({ sku: "CU", location: "A" });
    expect(neither.error!.issues.map((issue) => issue.path)).toEqual([
      ["quantity"],
    ]);
    const both = issueRequestSchema.safeParse({
      sku: "CU",
      location: "A",
      quantity: 1,
      grossKg: 4,
    });
    expect(both.error!.issues.map((issue) => issue.path)).toEqual([
      ["grossKg"],
    ]);
    const fine = issueRequestSchema.safeParse({
      sku: "CU",
      location: "A",
      quantity: 0.0005,
    });
    expect(fine.error!.issues[0]!.message).toBe(
      "The quantity has at most 3 decimals.",
    );
  });
});

describe("the page forms", () => {
  it("reads the chosen revision as design id and revision", () => {
    const submission = parseForm(
      form({ designRevision: "12/3", quantity: "25", note: "" }),
      { schema: createFormSchema, disableAutoCoercion: true },
    );
    expect(submission.status).toBe("success");
    if (submission.status === "success")
      expect(submission.value).toEqual({
        designId: 12,
        revision: 3,
        quantity: 25,
        note: undefined,
      });
    const none = parseForm(form({ designRevision: "", quantity: "0" }), {
      schema: createFormSchema,
      disableAutoCoercion: true,
    });
    expect(none.status).toBe("error");
    expect(Object.keys(none.reply().error ?? {}).sort()).toEqual([
      "designRevision",
      "quantity",
    ]);
  });

  it("reads the held stock chosen and a decimal comma", () => {
    const submission = parseForm(
      form({
        intent: "issue",
        spot: "CU-050|SP-1|WIRE-A1",
        quantity: "1,25",
        grossKg: "",
      }),
      { schema: issueFormSchema, disableAutoCoercion: true },
    );
    expect(submission.status).toBe("success");
    if (submission.status === "success")
      expect(submission.value).toMatchObject({
        sku: "CU-050",
        lot: "SP-1",
        location: "WIRE-A1",
        quantity: 1_250n,
      });
    const noLot = parseForm(
      form({ intent: "issue", spot: "BRG-1||PARTS", quantity: "2" }),
      { schema: issueFormSchema, disableAutoCoercion: true },
    );
    expect(noLot.status === "success" && noLot.value.lot).toBeUndefined();
    const nothing = parseForm(form({ intent: "issue" }), {
      schema: issueFormSchema,
      disableAutoCoercion: true,
    });
    expect(nothing.reply().error?.spot).toEqual([
      "Choose the lot and location to issue from.",
    ]);
  });

  it("reads the partial tick box", () => {
    const ticked = reserveFormSchema.parse({
      intent: "reserve",
      partial: "on",
    });
    expect(ticked.partial).toBe(true);
    expect(reserveFormSchema.parse({ intent: "reserve" }).partial).toBe(false);
  });
});
