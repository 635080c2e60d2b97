import { describe, expect, it } from "vitest";
import { buildOrderStatuses } from "~/db/tables/build-order-enums";
import {
  buildOrderIdInReference,
  buildOrderReference,
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

describe("buildOrderIdInReference", () => {
  it("reads the order a reference names, with or without the dash and spaces, in any case", () => {
    expect(buildOrderIdInReference("BO-12")).toBe(12);
    expect(buildOrderIdInReference("bo-12")).toBe(12);
    expect(buildOrderIdInReference("BO 12")).toBe(12);
    expect(buildOrderIdInReference("BO12")).toBe(12);
    expect(buildOrderIdInReference("BO – 0007")).toBe(7);
    expect(buildOrderIdInReference("for BO-4, coil 3")).toBe(4);
    // A part of an order is still that order.
    expect(buildOrderIdInReference("BO-12a")).toBe(12);
    // The page's own reference round-trips.
    expect(buildOrderIdInReference(buildOrderReference(4321))).toBe(4321);
  });

  it("reads the dashes, signs and full-width letters a keyboard or a paste may bring", () => {
    // Each of these is typed or pasted as "BO-12" by a person; the ledger must see order 12.
    for (const reference of [
      "BO\u221212", // minus sign
      "BO\u201212", // figure dash
      "BO\u201512", // horizontal bar
      "BO\uFF0D12", // full-width hyphen-minus
      "\uFF22\uFF2F\uFF0D\uFF11\uFF12", // full-width "BO-12"
      "BO\u00a012", // no-break space
      "BO\u200b-12", // zero-width space
      "BO_12",
      "BO#12",
      "BO/12",
      "BO.12",
      "BO: 12",
      "BO no. 12",
      "BO nr 12",
      "Build order 12",
      "build-order #12",
      "for build order no. 0012",
    ])
      expect(buildOrderIdInReference(reference), reference).toBe(12);
    // The largest order id the database holds (INT) has ten digits.
    expect(buildOrderIdInReference("BO-2147483647")).toBe(2147483647);
  });

  it("leaves other references alone", () => {
    for (const reference of [
      "",
      undefined,
      "JOB-12",
      "ROBO-3",
      "BOX-12",
      "BO-",
      "BO-0",
      "DN-3100",
      "BOB 12",
      "ELBOW 12",
      "rebuild order",
      "BO no.",
    ])
      expect(buildOrderIdInReference(reference), String(reference)).toBe(null);
  });
});
