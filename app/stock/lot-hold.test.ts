import { describe, expect, it } from "vitest";
import { heldChangeOf, heldPartOf, lotOnHoldMessage } from "./lot-hold";

// Quantities in thousandths, as the ledger keeps them: 4_800n is 4.800 kg.
describe("what a hold keeps from use", () => {
  it("is the free part of a balance: on hand less reserved", () => {
    // Worked by hand: 4.800 kg on the spool, 1.250 kg reserved → 3.550 kg held.
    expect(heldPartOf({ onHand: 4_800n, reserved: 1_250n })).toBe(3_550n);
    expect(heldPartOf({ onHand: 2_000n, reserved: 2_000n })).toBe(0n);
  });

  it("is never negative when a count left less on hand than is reserved", () => {
    // 1.000 kg counted against 1.500 kg reserved: nothing free, so nothing held.
    expect(heldPartOf({ onHand: 1_000n, reserved: 1_500n })).toBe(0n);
  });

  it("changes by the change of the free part", () => {
    // Scrapping 0.300 kg of a 3.550 kg free spool: held goes down by 0.300 kg.
    expect(
      heldChangeOf(
        { onHand: 4_800n, reserved: 1_250n },
        { onHand: 4_500n, reserved: 1_250n },
      ),
    ).toBe(-300n);
    // A reservation of 1.250 kg given back: held goes up by 1.250 kg.
    expect(
      heldChangeOf(
        { onHand: 4_800n, reserved: 1_250n },
        { onHand: 4_800n, reserved: 0n },
      ),
    ).toBe(1_250n);
    // A count from 1.000 kg (1.500 kg reserved) up to 2.000 kg frees 0.500 kg, not 1.000 kg.
    expect(
      heldChangeOf(
        { onHand: 1_000n, reserved: 1_500n },
        { onHand: 2_000n, reserved: 1_500n },
      ),
    ).toBe(500n);
  });

  it("names the lot and the reason in a refusal", () => {
    expect(lotOnHoldMessage("S-24-117", "enamel cracks on the wrap test")).toBe(
      "Lot S-24-117 is on hold: enamel cracks on the wrap test",
    );
  });
});
