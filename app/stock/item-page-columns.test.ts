import { createElement, type ComponentProps } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { DataTable } from "~/components/data-table";
import {
  balanceColumns,
  movementColumns,
  type ItemBalanceRow,
  type ItemMovementRow,
} from "./item-page-columns";

/** The table's header and body cells as text, row by row. */
function tableText<Row>(
  columns: ComponentProps<typeof DataTable<Row>>["columns"],
  rows: Row[],
): string[][] {
  const html = renderToStaticMarkup(
    createElement(DataTable<Row>, { caption: "t", columns, rows }),
  );
  return [...html.matchAll(/<tr[^>]*>(.*?)<\/tr>/g)].map((row) =>
    [...row[1]!.matchAll(/<t[hd][^>]*>(.*?)<\/t[hd]>/g)].map((cell) =>
      cell[1]!
        .replace(/<[^>]+>/g, "")
        .replace(/&#x27;/g, "'")
        .replace(/\u00a0/g, " "),
    ),
  );
}

const spool: ItemBalanceRow = {
  location: "MAIN",
  locationName: "Main store",
  lot: "L1",
  tareKg: 0.6,
  onHand: 4.8,
  reserved: 1.25,
  holdReason: null,
};

describe("where the item is", () => {
  it("shows a wire spool's tare", () => {
    expect(
      tableText(balanceColumns("kg", true), [
        spool,
        {
          ...spool,
          lot: null,
          tareKg: null,
          location: "BENCH",
          locationName: "Bench",
        },
      ]),
    ).toEqual([
      ["Location", "Lot", "Spool tare", "On hand", "Reserved"],
      ["MAIN Main store", "L1", "0.600 kg", "4.800 kg", "1.250 kg"],
      ["BENCH Bench", "—", "—", "4.800 kg", "1.250 kg"],
    ]);
  });

  it("has no tare column for pieces", () => {
    expect(
      tableText(balanceColumns("pcs", false), [
        { ...spool, tareKg: null, onHand: 40, reserved: 1 },
      ]),
    ).toEqual([
      ["Location", "Lot", "On hand", "Reserved"],
      ["MAIN Main store", "L1", "40 pieces", "1 piece"],
    ]);
  });
});

describe("a lot on hold", () => {
  it("is marked on hold with its reason in words and as a tooltip", () => {
    const reason = "Enamel cracks on the mandrel wrap test";
    const rows = [
      { ...spool, holdReason: reason },
      { ...spool, lot: "L2" },
    ];
    expect(tableText(balanceColumns("kg", true), rows).slice(1)).toEqual([
      [
        "MAIN Main store",
        `L1 On hold${reason}`,
        "0.600 kg",
        "4.800 kg",
        "1.250 kg",
      ],
      ["MAIN Main store", "L2", "0.600 kg", "4.800 kg", "1.250 kg"],
    ]);
    const html = renderToStaticMarkup(
      createElement(DataTable<ItemBalanceRow>, {
        caption: "t",
        columns: balanceColumns("kg", true),
        rows,
      }),
    );
    expect(html).toContain(`title="${reason}"`);
  });
});

describe("the item's movements", () => {
  const issue: ItemMovementRow = {
    createdAt: "2026-12-02T14:05:00.000Z",
    type: "issue",
    lot: "L1",
    location: "MAIN",
    quantity: -1.2,
    itemOnHandAfter: 3.6,
    unitCost: null,
    reference: "JOB-4",
    note: "weighed back",
    user: "Stella",
  };

  it("writes the change with its sign and joins reference and note", () => {
    const [header, row] = tableText(movementColumns("kg"), [issue]);
    expect(header).toEqual([
      "When",
      "Movement",
      "Lot",
      "Location",
      "Change",
      "On hand after",
      "Unit cost",
      "Reference and note",
      "By",
    ]);
    expect(row).toEqual([
      "2 Dec 2026, 14:05 UTC",
      "Issue",
      "L1",
      "MAIN",
      "−1.200 kg",
      "3.600 kg",
      "—",
      "JOB-4 · weighed back",
      "Stella",
    ]);
  });

  it("shows a receipt's unit cost and a dash for no reference", () => {
    const [, row] = tableText(movementColumns("pcs"), [
      {
        ...issue,
        type: "receipt",
        lot: null,
        quantity: 40,
        itemOnHandAfter: 40,
        unitCost: 0.85,
        reference: null,
        note: null,
      },
    ]);
    expect(row).toEqual([
      "2 Dec 2026, 14:05 UTC",
      "Receipt",
      "—",
      "MAIN",
      "+40 pieces",
      "40 pieces",
      "0.8500 per piece",
      "—",
      "Stella",
    ]);
  });
});
