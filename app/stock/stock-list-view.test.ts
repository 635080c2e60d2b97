import { describe, expect, it } from "vitest";
import {
  exportSearch,
  itemListQueryOf,
  readStockListView,
  sortSearch,
  stockListSearch,
} from "./stock-list-view";

const read = (query: string) => readStockListView(new URLSearchParams(query));

describe("stock list view in the address", () => {
  it("reads filters, sort and page, with defaults for what is missing", () => {
    const { view, ignored } = read(
      "search=AWG&kind=wire&belowReorder=1&sort=value&order=desc&page=3",
    );
    expect(ignored).toEqual([]);
    expect(view).toEqual({
      search: "AWG",
      kind: "wire",
      belowReorder: true,
      archived: false,
      sort: "value",
      order: "desc",
      page: 3,
    });
    expect(read("").view).toEqual({
      belowReorder: false,
      archived: false,
      sort: "sku",
      order: "asc",
      page: 1,
    });
  });

  it("leaves out values it cannot use and names them; a page is corrected", () => {
    const { view, ignored } = read(
      "kind=spring&sort=colour&page=0&search=copper",
    );
    expect(ignored).toEqual(["kind", "sort"]);
    expect(view.kind).toBeUndefined();
    expect(view.sort).toBe("sku");
    expect(view.page).toBe(1);
    expect(view.search).toBe("copper");
  });

  it("reads a page beyond every list as the last possible page (the page then shows its last)", () => {
    expect(read("page=1e300").view.page).toBe(1_000_000);
    expect(read("page=99999999999999999999").view.page).toBe(1_000_000);
    expect(read("page=abc").view.page).toBe(1);
  });

  it("ignores a page size in the address: the page shows 50 rows", () => {
    expect(itemListQueryOf(read("pageSize=500").view).pageSize).toBe(50);
  });

  it("turns the view into the list query", () => {
    expect(
      itemListQueryOf(read("archived=1&order=desc&sort=name").view, 10),
    ).toEqual({
      search: undefined,
      kind: undefined,
      belowReorder: false,
      includeArchived: true,
      sort: "name",
      descending: true,
      page: 1,
      pageSize: 10,
    });
  });

  it("writes links that round-trip and leave defaults out", () => {
    const { view } = read("kind=magnet&search=N42&page=2");
    expect(stockListSearch(view)).toBe("?search=N42&kind=magnet&page=2");
    expect(read(stockListSearch(view).slice(1)).view).toEqual(view);
    expect(stockListSearch(read("").view)).toBe("");
  });

  it("sorts a new column ascending from page 1 and turns the sorted column round", () => {
    const { view } = read("sort=name&page=4");
    expect(sortSearch(view, "name")).toBe("?sort=name&order=desc");
    expect(sortSearch(view, "onHand")).toBe("?sort=onHand");
    expect(sortSearch(read("sort=name&order=desc").view, "name")).toBe(
      "?sort=name",
    );
  });

  it("exports the whole view, not one page", () => {
    expect(exportSearch(read("kind=wire&page=7&sort=value").view)).toBe(
      "?kind=wire&sort=value",
    );
  });
});
