import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { MemoryRouter } from "react-router";
import { describe, expect, it } from "vitest";
import { DataTable } from "~/components/data-table";
import { issuesNewestFirst } from "~/build-orders/build-order-view";
import {
  buildOrderLineColumns,
  type BuildOrderLine,
} from "./build-order-line-columns";
import { buildOrderListColumns } from "./build-order-list-columns";
import { issuedStockColumns } from "./issued-stock-columns";
import { plannedAndUsedColumns } from "./planned-and-used-columns";

function table<Row>(
  columns: Parameters<typeof DataTable<Row>>[0]["columns"],
  rows: Row[],
) {
  const html = renderToStaticMarkup(
    createElement(
      MemoryRouter,
      null,
      createElement(DataTable<Row>, { caption: "Table", columns, rows }),
    ),
  );
  const text = (tag: "th" | "td") =>
    [...html.matchAll(new RegExp(`<${tag}[^>]*>(.*?)</${tag}>`, "g"))].map(
      (match) =>
        match[1]!
          .replace(/<[^>]+>/g, " ")
          .replace(/\s+/g, " ")
          .trim(),
    );
  return { html, headers: text("th"), cells: text("td") };
}

const wire: BuildOrderLine = {
  sku: "W-0.5",
  name: "Enamelled wire 0.5 mm",
  kind: "wire",
  unit: "kg",
  required: 1.442,
  reserved: 1,
  issued: 0.8,
  toReserve: 0,
  available: 2,
  short: 0.25,
  difference: -0.642,
  plannedUnitCost: 12.5,
  plannedCost: 18.03,
  actualCost: 10,
  held: [],
  stock: [
    ...["A1", "A2", "A3", "A4", "A5"].map((location, index) => ({
      lot: index === 0 ? "SP-7" : null,
      location,
      receivedOn: "2026-01-01",
      onHand: 2,
      reserved: index === 0 ? 1 : 0,
      free: index === 0 ? 1 : 2,
      onHold: false,
    })),
    {
      lot: null,
      location: "EMPTY",
      receivedOn: "2026-01-01",
      onHand: 0,
      reserved: 0,
      free: 0,
      onHold: false,
    },
  ],
  issues: [
    {
      movementId: 9,
      at: "2026-02-01T10:00:00.000Z",
      lot: "SP-7",
      location: "A1",
      quantity: 0.8,
      grossKg: 4.6,
      unitCost: 12.5,
      by: "Sam Store",
    },
  ],
};

describe("the order page's line columns", () => {
  it("show the item, its figures in its unit and where it is", () => {
    const { html, headers, cells } = table(buildOrderLineColumns, [wire]);
    expect(headers).toEqual([
      "Item",
      "Needed",
      "Held",
      "Issued",
      "Still to hold",
      "Free in store",
      "Short",
      "Where it is (oldest lot first)",
    ]);
    expect(html).toContain('href="/stock/items/W-0.5"');
    expect(cells[0]).toBe("W-0.5 Enamelled wire 0.5 mm");
    expect(cells[6]).toContain("0.250");
    expect(cells[7]).toContain("lot SP-7 · A1");
    expect(cells[7]).toContain("free of");
    expect(cells[7]).toContain("and 1 more places");
    expect(cells[7]).not.toContain("EMPTY");
  });

  it("say when nothing is short or in store", () => {
    const { cells } = table(buildOrderLineColumns, [
      { ...wire, short: 0, stock: [] },
    ]);
    expect(cells[6]).toBe("—");
    expect(cells[7]).toBe("none in store");
  });
});

describe("the planned-and-used columns", () => {
  it("name the currency and sign the difference", () => {
    const { headers, cells } = table(plannedAndUsedColumns("EUR"), [
      wire,
      { ...wire, sku: "M-1", difference: 0.5, plannedCost: null },
    ]);
    expect(headers).toEqual([
      "Item",
      "Planned",
      "Used (issued)",
      "Difference",
      "Planned cost (EUR)",
      "Actual cost (EUR)",
    ]);
    expect(cells[3]).toMatch(/^−0\.642/);
    expect(cells[9]).toMatch(/^\+0\.500/);
    expect(cells[10]).toBe("no cost yet");
  });
});

describe("the issued-stock columns", () => {
  it("show each issue with where it came from and the spool's weight", () => {
    const { headers, cells } = table(
      issuedStockColumns,
      issuesNewestFirst([wire]),
    );
    expect(headers).toEqual([
      "When",
      "Item",
      "From",
      "Issued",
      "Spool weighed at",
      "Average cost then",
      "By",
    ]);
    expect(cells[1]).toBe("W-0.5");
    expect(cells[2]).toBe("lot SP-7 · A1");
    expect(cells[4]).toContain("4.600");
    expect(cells[6]).toBe("Sam Store");
  });
});

describe("the build-order list columns", () => {
  it("link each order by its reference", () => {
    const { html, headers, cells } = table(buildOrderListColumns, [
      {
        id: 12,
        design: { id: 3, name: "Hub motor" },
        revision: 2,
        quantity: 4,
        status: "reserved",
        note: "",
        plannedStart: null,
        createdBy: "Bo Builder",
        createdAt: "2026-02-01T10:00:00.000Z",
        updatedAt: "2026-02-01T10:00:00.000Z",
      },
    ]);
    expect(headers).toEqual([
      "Order",
      "Design",
      "Motors",
      "Status",
      "Made by",
      "Made",
      "Note",
    ]);
    expect(html).toContain('href="/build-orders/12"');
    expect(cells[0]).toBe("BO-12");
    expect(cells[1]).toBe("Hub motor rev. 2");
    expect(cells[2]).toBe("4 motors");
  });
});
