import { describe, expect, it } from "vitest";
import { lineItemTexts } from "./line-item-texts";

describe("a design line's item field, by the line's kind", () => {
  it("offers only wire on a coil line and only magnets on a magnet line", () => {
    expect(lineItemTexts.coil.label).toBe("Wire");
    expect(lineItemTexts.coil.itemKind).toBe("wire");
    expect(lineItemTexts.magnet.label).toBe("Magnet");
    expect(lineItemTexts.magnet.itemKind).toBe("magnet");
  });

  it("offers any catalogue item on a part line", () => {
    expect(lineItemTexts.part.label).toBe("Item");
    expect(lineItemTexts.part.itemKind).toBeUndefined();
    expect(lineItemTexts.part.hint).toMatch(/^Any catalogue item/);
  });
});
