import { describe, expect, it } from "vitest";
import {
  EngineeringInputError,
  isEngineeringInputError,
  requireFinite,
  requireNonNegative,
  requirePositive,
  requireWholeNumber,
  requireWithin,
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

describe("the range checks added for issue 19 (fix 6)", () => {
  it("requireFinite refuses NaN and infinities", () => {
    expect(() => requireFinite(Number.NaN, "temperatureC", "T")).toThrow(
      EngineeringInputError,
    );
    expect(() =>
      requireFinite(Number.NEGATIVE_INFINITY, "temperatureC", "T"),
    ).toThrow(EngineeringInputError);
    expect(() => requireFinite(-40, "temperatureC", "T")).not.toThrow();
  });

  it("requireWholeNumber refuses fractions, NaN and values below the minimum", () => {
    expect(() => requireWholeNumber(2.5, "turns", "Turns")).toThrow(
      EngineeringInputError,
    );
    expect(() => requireWholeNumber(0, "turns", "Turns")).toThrow(
      EngineeringInputError,
    );
    expect(() => requireWholeNumber(0, "turns", "Turns", 0)).not.toThrow();
    expect(() => requireWholeNumber(Number.NaN, "turns", "Turns")).toThrow(
      EngineeringInputError,
    );
  });

  it("requireWithin includes both bounds and writes the minus sign", () => {
    expect(() => requireWithin(-70, "t", "T", -70, 400)).not.toThrow();
    expect(() => requireWithin(400, "t", "T", -70, 400)).not.toThrow();
    try {
      requireWithin(401, "temperatureC", "The temperature", -70, 400, "°C");
      expect.unreachable();
    } catch (error) {
      expect((error as EngineeringInputError).field).toBe("temperatureC");
      expect((error as Error).message).toBe(
        "The temperature must be a number from −70 °C to 400 °C.",
      );
    }
  });
});
