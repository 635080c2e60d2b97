import { describe, expect, it } from "vitest";
import { csvFile } from "~/lib/csv-file";
import {
  lineTotalCents,
  purchaseOrderCsvHeaders,
  purchaseOrderCsvRows,
  purchaseOrderDocument,
  type PurchaseOrderDocumentInput,
} from "./purchase-order-document";

const order: PurchaseOrderDocumentInput = {
  company: "Example Motor Works",
  number: "PO-000042",
  status: "sent",
  currency: "EUR",
  notes: "Deliver to gate 2.",
  orderDate: "2026-03-20",
  supplier: {
    name: "Aster Wire",
    orderEmail: "orders@aster.test",
    email: "info@aster.test",
  },
  lines: [
    {
      lineNumber: 1,
      sku: "CU080-G2",
      supplierSku: "AW-080",
      name: "Enamelled copper 0.80 mm grade 2",
      unit: "kg",
      quantity: 12_500n,
      unitPrice: 682_500n,
      metalBasePerKg: 650_000n,
      adderPerKg: 32_500n,
      metalBaseFixedAt: "delivery",
      requestedDate: null,
      expectedDate: "2026-04-03",
    },
    {
      lineNumber: 2,
      sku: "N42SH-D10",
      supplierSku: "",
      name: "N42SH disc 10×3",
      unit: "pcs",
      quantity: 120_000n,
      unitPrice: 21_000n,
      metalBasePerKg: null,
      adderPerKg: null,
      metalBaseFixedAt: null,
      requestedDate: "2026-05-01",
      expectedDate: "2026-05-01",
    },
  ],
};

describe("purchase-order document (worked example by hand)", () => {
  // 12.5 kg × 68.25 = 853.125 → 853.13 (half away from zero); 120 × 2.10 = 252.00;
  // total 853.13 + 252.00 = 1,105.13 EUR.
  it("rounds each line total to the cent and adds the rounded totals", () => {
    expect(lineTotalCents(12_500n, 682_500n)).toBe(85_313n);
    expect(lineTotalCents(120_000n, 21_000n)).toBe(25_200n);
    const document = purchaseOrderDocument(order);
    expect(document.totalCents).toBe(110_513n);
    expect(document.totalText).toBe("1,105.13\u00a0EUR");
    expect(document.rows.map((row) => row.lineTotal)).toEqual([
      "853.13",
      "252.00",
    ]);
  });

  it("shows quantities with their unit, prices per unit and dates as people read them", () => {
    const [wire, magnet] = purchaseOrderDocument(order).rows;
    expect(wire).toMatchObject({
      quantity: "12.500\u00a0kg",
      unitPrice: "68.2500 EUR/kg",
      requestedDate: "—",
      expectedDate: "3 Apr 2026",
    });
    expect(wire!.priceNote).toBe(
      "Metal base 65.0000 + adder 3.2500 EUR/kg, base fixed on the delivery day",
    );
    expect(magnet).toMatchObject({
      quantity: "120\u00a0pieces",
      unitPrice: "2.1000 EUR/piece",
      supplierSku: "—",
      requestedDate: "1 May 2026",
      priceNote: null,
    });
  });

  it("names the order, its date, supplier and order address", () => {
    const document = purchaseOrderDocument(order);
    expect(document.title).toBe("Purchase order PO-000042");
    expect(document.facts).toEqual([
      { label: "Order number", value: "PO-000042" },
      { label: "Order date", value: "20 Mar 2026" },
      { label: "Supplier", value: "Aster Wire" },
      { label: "Supplier e-mail", value: "orders@aster.test" },
      { label: "Currency", value: "EUR" },
      { label: "Status", value: "Sent" },
    ]);
    expect(
      purchaseOrderDocument({ ...order, status: "draft" }).facts[1],
    ).toEqual({ label: "Drafted on", value: "20 Mar 2026" });
  });

  it("writes the CSV with exact decimals and days", () => {
    const text = csvFile(purchaseOrderCsvHeaders, purchaseOrderCsvRows(order));
    expect(text.split("\r\n")).toEqual([
      "\uFEFFline,our_sku,supplier_sku,description,quantity,unit,unit_price,currency,line_total,requested_date,expected_date",
      "1,CU080-G2,AW-080,Enamelled copper 0.80 mm grade 2,12.500,kg,68.2500,EUR,853.13,,2026-04-03",
      "2,N42SH-D10,,N42SH disc 10×3,120.000,pcs,2.1000,EUR,252.00,2026-05-01,2026-05-01",
      "",
    ]);
  });
});
