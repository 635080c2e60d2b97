import { describe, expect, it } from "vitest";
import { buildOrderStepNote } from "./build-order-step-notes";

describe("buildOrderStepNote", () => {
  it("says the stock is held, or that it already was when nothing more was reserved", () => {
    expect(
      buildOrderStepNote(12, { step: "reserve", reservedCount: 3 }),
    ).toEqual({ code: "order-reserved", id: 12 });
    expect(
      buildOrderStepNote(12, { step: "reserve", reservedCount: 0 }),
    ).toEqual({ code: "order-already-held", id: 12 });
  });

  it("tells an issue by its movement, not by the order", () => {
    expect(buildOrderStepNote(12, { step: "issue", movementId: 345 })).toEqual({
      code: "order-issued",
      id: 345,
    });
  });

  it("names the cancelled and the built order", () => {
    expect(buildOrderStepNote(12, { step: "cancel" })).toEqual({
      code: "order-cancelled",
      id: 12,
    });
    expect(buildOrderStepNote(12, { step: "complete" })).toEqual({
      code: "order-built",
      id: 12,
    });
  });

  it("says when a new number of motors released what was held", () => {
    expect(
      buildOrderStepNote(12, { step: "quantity", releasedCount: 2 }),
    ).toEqual({ code: "order-quantity-changed-released", id: 12 });
    expect(
      buildOrderStepNote(12, { step: "quantity", releasedCount: 0 }),
    ).toEqual({ code: "order-quantity-changed", id: 12 });
  });
});
