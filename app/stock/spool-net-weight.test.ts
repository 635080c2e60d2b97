import { describe, expect, it } from "vitest";
import { spoolNetKg } from "./spool-net-weight";

describe("spoolNetKg", () => {
  it("is gross − tare to the gram", () => {
    // Engineering brief, worked check 6: gross 5.40 kg, tare 0.60 kg → net 4.80 kg.
    expect(spoolNetKg("5.4", "0.6")).toBe(4.8);
    expect(spoolNetKg("5,4", "0,6")).toBe(4.8);
    // By hand: 12.345 − 1.111 = 11.234 (exact, no floating-point residue).
    expect(spoolNetKg("12.345", "1.111")).toBe(11.234);
    expect(spoolNetKg("0.3", "0.1")).toBe(0.2);
  });

  it("tells a tare as heavy as the gross (zero or less)", () => {
    expect(spoolNetKg("0.6", "0.6")).toBe(0);
    expect(spoolNetKg("0.5", "0.6")).toBe(-0.1);
  });

  it("waits until both weights are numbers of at most 3 decimals", () => {
    expect(spoolNetKg("", "0.6")).toBeNull();
    expect(spoolNetKg("5.4", "")).toBeNull();
    expect(spoolNetKg("five", "0.6")).toBeNull();
    expect(spoolNetKg("5.4001", "0.6")).toBeNull();
  });
});
