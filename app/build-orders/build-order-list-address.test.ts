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

  it("keeps a search beside the status", () => {
    expect(buildOrderListHref({ search: "BO-1 stator", status: "draft" })).toBe(
      "/build-orders?search=BO-1+stator&status=draft",
    );
  });
});

describe("buildOrderListHref", () => {
  it("leaves out the defaults", () => {
    expect(buildOrderListHref({})).toBe("/build-orders");
    expect(buildOrderListHref({}, 1)).toBe("/build-orders");
  });

  it("keeps the status and a later page", () => {
    expect(buildOrderListHref({ status: "reserved" })).toBe(
      "/build-orders?status=reserved",
    );
    expect(buildOrderListHref({}, 3)).toBe("/build-orders?page=3");
    expect(buildOrderListHref({ status: "complete" }, 2)).toBe(
      "/build-orders?status=complete&page=2",
    );
  });

  it("keeps a search beside the status", () => {
    expect(buildOrderListHref({ search: "BO-1 stator", status: "draft" })).toBe(
      "/build-orders?search=BO-1+stator&status=draft",
    );
  });
});
