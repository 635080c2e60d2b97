import { describe, expect, it } from "vitest";
import {
  readBestPriceListQuery,
  readItemPriceQuantity,
} from "./price-quantity-query";

const params = (text: string) => new URLSearchParams(text);

describe("the quantity asked for prices", () => {
  it("reads a quantity in thousandths of the item's unit", () => {
    expect(readItemPriceQuantity(params("quantity=2.5"))).toEqual({
      quantity: 2_500n,
      text: "2.5",
      error: undefined,
    });
  });

  it("takes blank as each item's own quantity", () => {
    expect(readItemPriceQuantity(params("quantity="))).toEqual({
      quantity: null,
      text: "",
      error: undefined,
    });
  });

  it("sets aside a bad quantity with its message instead of failing the page", () => {
    for (const bad of ["0", "-1", "1e300", "2.5000", "lots"]) {
      const read = readItemPriceQuantity(params(`quantity=${bad}`));
      expect(read.quantity).toBeNull();
      expect(read.error).toMatch(/^quantity must be a number above 0/);
    }
  });

  it("reads the list's search, quantity and page together", () => {
    expect(
      readBestPriceListQuery(params("search=cu&quantity=25&page=3")),
    ).toMatchObject({ search: "cu", quantity: 25_000n, page: 3 });
    expect(readBestPriceListQuery(params(""))).toMatchObject({
      search: "",
      quantity: null,
      page: 1,
    });
  });
});
