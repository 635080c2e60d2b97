import { describe, expect, it } from "vitest";
import { weighBackPreview } from "./weigh-back-preview";

describe("weighBackPreview", () => {
  it("takes the spool's net now from its net before", () => {
    // Engineering brief, worked check 6: gross 5.40 kg, tare 0.60 kg → net 4.80 kg now;
    // by hand, a spool that held 6.000 kg net gives 6.000 − 4.800 = 1.200 kg.
    const preview = weighBackPreview(6, "5.4", 0.6);
    expect(preview?.issueKg).toBe(1.2);
    expect(preview?.netNowKg).toBeCloseTo(4.8, 12);
    expect(weighBackPreview(6, "5,4", 0.6)?.issueKg).toBe(1.2);
  });

  it("rounds the issue to the gram", () => {
    // By hand: 2.5 − (1.2345 − 0.3) = 1.5655 → 1.566 kg (half up at the gram).
    expect(weighBackPreview(2.5, "1.2345", 0.3)?.issueKg).toBe(1.566);
  });

  it("says nothing is issued when the spool weighs its net or more", () => {
    // −0 or 0: either is "nothing to issue".
    expect(Math.abs(weighBackPreview(4.8, "5.4", 0.6)!.issueKg)).toBe(0);
    expect(weighBackPreview(4.8, "6", 0.6)?.issueKg).toBeCloseTo(-0.6, 12);
  });

  it("waits for a gross weight that is a number and not below the tare", () => {
    expect(weighBackPreview(6, "", 0.6)).toBeNull();
    expect(weighBackPreview(6, "  ", 0.6)).toBeNull();
    expect(weighBackPreview(6, "five", 0.6)).toBeNull();
    expect(weighBackPreview(6, "0.5", 0.6)).toBeNull();
    expect(weighBackPreview(6, "-1", 0)).toBeNull();
    expect(weighBackPreview(6, "0.6", 0.6)?.issueKg).toBe(6);
  });
});
