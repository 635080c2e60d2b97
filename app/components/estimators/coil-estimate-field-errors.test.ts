import { describe, expect, it } from "vitest";
import { coilFormFieldErrors } from "./coil-estimate-field-errors";

describe("the coil estimator's field messages from the API", () => {
  it("puts each API field's messages beside its form field", () => {
    expect(
      coilFormFieldErrors({
        ok: false,
        status: 400,
        message: "Check the fields.",
        fields: {
          turns: ["The number of turns must be a whole number."],
          "wire.size": ["There is no AWG size 99."],
          "wire.diameterMm": ["There is no IEC diameter 0.801 mm."],
          wire: ["Give the wire."],
        },
      }),
    ).toEqual({
      turns: ["The number of turns must be a whole number."],
      awgSize: ["There is no AWG size 99."],
      iecDiameterMm: ["There is no IEC diameter 0.801 mm."],
      standard: ["Give the wire."],
    });
  });

  it("has none for an estimate or before any answer", () => {
    expect(coilFormFieldErrors({ ok: true, data: {} })).toEqual({});
    expect(coilFormFieldErrors(undefined)).toEqual({});
    expect(
      coilFormFieldErrors({
        ok: false,
        status: 0,
        message: "Turnledger could not be reached.",
        fields: {},
      }),
    ).toEqual({});
  });
});
