/**
 * The one-time message the order page shows after each step (the words are in
 * app/lib/flash-messages.ts): which message, and the id it is about. Pure.
 */
import type { FlashNote } from "~/lib/flash-messages";

/** What a step of the order page did, as far as its message tells it. */
export type BuildOrderStepOutcome =
  | { step: "reserve"; reservedCount: number }
  | { step: "issue"; movementId: number }
  | { step: "cancel" }
  | { step: "complete" }
  | { step: "quantity"; releasedCount: number }
  | { step: "plannedStart" };

/** The message after a step on order `orderId`. */
export function buildOrderStepNote(
  orderId: number,
  outcome: BuildOrderStepOutcome,
): FlashNote {
  switch (outcome.step) {
    case "reserve":
      return {
        code:
          outcome.reservedCount === 0 ? "order-already-held" : "order-reserved",
        id: orderId,
      };
    case "issue":
      return { code: "order-issued", id: outcome.movementId };
    case "cancel":
      return { code: "order-cancelled", id: orderId };
    case "complete":
      return { code: "order-built", id: orderId };
    case "plannedStart":
      return { code: "order-planned-start-changed", id: orderId };
    case "quantity":
      return {
        code:
          outcome.releasedCount > 0
            ? "order-quantity-changed-released"
            : "order-quantity-changed",
        id: orderId,
      };
  }
}
