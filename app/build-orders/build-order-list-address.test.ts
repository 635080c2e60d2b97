import { describe, expect, it } from "vitest";
import {
  buildOrderListHref,
  buildOrderStatusFrom,
} from "./build-order-list-address";

describe("buildOrderStatusFrom", () => {
  it("reads a status of an order", () => {
    expect(buildOrderStatusFrom("in_progress")).toBe("in_progress");
    expect(buildOrderStatusFrom("draft")).toBe("draft");
  });

  it("ignores anything else", () => {
    for (const value of [null, "", "Draft", "built", "in progress"])
      expect(buildOrderStatusFrom(value)).toBeUndefined();
  });
});

describe("buildOrderListHref", () => {
  it("leaves out the defaults", () => {
    expect(buildOrderListHref(null)).toBe("/build-orders");
    expect(buildOrderListHref(null, 1)).toBe("/build-orders");
  });

  it("keeps the status and a later page", () => {
    expect(buildOrderListHref("reserved")).toBe(
      "/build-orders?status=reserved",
    );
    expect(buildOrderListHref(null, 3)).toBe("/build-orders?page=3");
    expect(buildOrderListHref("complete", 2)).toBe(
      "/build-orders?status=complete&page=2",
    );
  });
});
