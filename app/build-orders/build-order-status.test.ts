import { describe, expect, it } from "vitest";
import { buildOrderStatuses } from "~/db/tables/build-orders";
import {
  canCancel,
  canChangeQuantity,
  canComplete,
  canIssue,
  canReserve,
} from "./build-order-status";

describe("build order states", () => {
  it("allows each step only where the life of an order has it", () => {
    const table = Object.fromEntries(
      buildOrderStatuses.map((status) => [
        status,
        [
          canReserve(status),
          canIssue(status),
          canComplete(status),
          canCancel(status),
          canChangeQuantity(status),
        ],
      ]),
    );
    // reserve, issue, complete, cancel, change quantity
    expect(table).toEqual({
      draft: [true, false, false, true, true],
      reserved: [true, true, false, true, true],
      in_progress: [true, true, true, true, false],
      complete: [false, false, false, false, false],
      cancelled: [false, false, false, false, false],
    });
  });
});
