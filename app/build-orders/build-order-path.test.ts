import { describe, expect, it } from "vitest";
import { buildOrderIdFromPath } from "./build-order-path";

const refuse = (message: string) => new Error(message);

describe("buildOrderIdFromPath", () => {
  it("reads a whole number from 1", () => {
    expect(buildOrderIdFromPath("12", refuse)).toBe(12);
    expect(buildOrderIdFromPath("007", refuse)).toBe(7);
    expect(buildOrderIdFromPath("2147483647", refuse)).toBe(2_147_483_647);
  });

  it("throws what the caller makes of the not-found text otherwise", () => {
    for (const value of ["0", "-1", "1.5", "BO-12", "12 ", "2147483648", ""])
      expect(() => buildOrderIdFromPath(value, refuse)).toThrow(
        `No build order "${value}".`,
      );
    expect(() => buildOrderIdFromPath(undefined, refuse)).toThrow(
      'No build order "".',
    );
  });

  it("throws the caller's own answer", () => {
    const answer = { status: 404 };
    expect(() => buildOrderIdFromPath("x", () => answer)).toThrow();
    try {
      buildOrderIdFromPath("x", () => answer);
    } catch (thrown) {
      expect(thrown).toBe(answer);
    }
  });
});
