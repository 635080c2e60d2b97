import { describe, expect, it } from "vitest";
import {
  EngineeringInputError,
  isEngineeringInputError,
  requireNonNegative,
  requirePositive,
} from "./errors";

describe("EngineeringInputError", () => {
  it("carries the field and a message for people", () => {
    const error = new EngineeringInputError(
      "wire.size",
      "AWG size 47 is not known.",
    );
    expect(error).toBeInstanceOf(Error);
    expect(error.field).toBe("wire.size");
    expect(error.message).toBe("AWG size 47 is not known.");
    expect(isEngineeringInputError(error)).toBe(true);
    expect(isEngineeringInputError(new Error("other"))).toBe(false);
    expect(isEngineeringInputError("wire.size")).toBe(false);
  });

  it("is what the range checks throw", () => {
    expect(() => requirePositive(0, "turns", "Turns")).toThrow(
      EngineeringInputError,
    );
    expect(() => requirePositive(Number.NaN, "turns", "Turns")).toThrow(
      EngineeringInputError,
    );
    expect(() => requireNonNegative(-1, "leadLengthMm", "Lead length")).toThrow(
      EngineeringInputError,
    );
    expect(() =>
      requireNonNegative(0, "leadLengthMm", "Lead length"),
    ).not.toThrow();
  });
});
