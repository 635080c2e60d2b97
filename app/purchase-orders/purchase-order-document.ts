/**
 * The printable purchase order's content, one source for the print page, the PDF and the
 * CSV sent to the supplier: the heading facts, one row per line, the total and the notes.
 * Pure: takes the order as loaded, returns texts and exact amounts.
 *
 * Line totals are quantity × unit price rounded half away from zero to the cent, and the
 * order's total is the sum of the rounded line totals, so the printed lines add up to the
 * printed total (the way a priced invoice reads; common practice).
 */
import type { CalendarDate } from "~/lib/calendar-days";
import type { CsvCell } from "~/lib/csv-file";
import {
  divideHalfAwayFromZero,
  formatQuantityText,
  formatUnitCostText,
  quantityToNumber,
} from "~/lib/decimal-amounts";
import { formatAmount, formatDay, formatQuantity } from "~/lib/format";
import { perUnitWord, quantityText } from "~/lib/unit-text";
import type {
  MetalBaseFixing,
  PurchaseOrderStatus,
} from "~/db/tables/purchase-order-enums";
import { purchaseOrderStatusLabels } from "./purchase-order-status";

export interface PurchaseOrderDocumentLine {
  lineNumber: number;
  sku: string;
  supplierSku: string;
  name: string;
  unit: string;
  /** Thousandths of the item's unit. */
  quantity: bigint;
  /** Ten-thousandths of the order's currency per unit. */
  unitPrice: bigint;
  metalBasePerKg: bigint | null;
  adderPerKg: bigint | null;
  metalBaseFixedAt: MetalBaseFixing | null;
  requestedDate: CalendarDate | null;
  expectedDate: CalendarDate;
}

export interface PurchaseOrderDocumentInput {
  company: string;
  number: string;
  status: PurchaseOrderStatus;
  currency: string;
  notes: string;
  /** The sending day, or the creation day while draft. */
  orderDate: CalendarDate;
  supplier: { name: string; orderEmail: string | null; email: string | null };
  lines: readonly PurchaseOrderDocumentLine[];
}

export interface PurchaseOrderDocumentRow {
  line: string;
  sku: string;
  supplierSku: string;
  description: string;
  /** "25.000 kg", "200 pieces". */
  quantity: string;
  /** "12.2000" in the order's currency per unit. */
  unitPrice: string;
  /** "305.00" */
  lineTotal: string;
  requestedDate: string;
  expectedDate: string;
  /** For wire on the metal base: "base 8.9500 + adder 3.2500 EUR/kg, base fixed at order". */
  priceNote: string | null;
  /** Cents of the order's currency. */
  lineTotalCents: bigint;
}

export const purchaseOrderColumns = [
  { key: "line", label: "Line" },
  { key: "sku", label: "Our SKU" },
  { key: "supplierSku", label: "Supplier SKU" },
  { key: "description", label: "Description" },
  { key: "quantity", label: "Quantity" },
  { key: "unitPrice", label: "Unit price" },
  { key: "lineTotal", label: "Line total" },
  { key: "requestedDate", label: "Requested" },
  { key: "expectedDate", label: "Expected" },
] as const;

const fixedAtWords: Record<MetalBaseFixing, string> = {
  order: "base fixed when ordered",
  delivery: "base fixed on the delivery day",
};

/** quantity × unit price to the cent, half away from zero. */
export function lineTotalCents(quantity: bigint, unitPrice: bigint): bigint {
  // thousandths × ten-thousandths = 10⁻⁷; cents are 10⁻².
  return divideHalfAwayFromZero(quantity * unitPrice, 100_000n);
}

const centsText = (cents: bigint) =>
  formatUnitCostText(cents * 100n).slice(0, -2);

/** The whole printable order. */
export function purchaseOrderDocument(input: PurchaseOrderDocumentInput) {
  const rows: PurchaseOrderDocumentRow[] = input.lines.map((line) => {
    const cents = lineTotalCents(line.quantity, line.unitPrice);
    const per = `${input.currency}/${perUnitWord(line.unit)}`;
    return {
      line: String(line.lineNumber),
      sku: line.sku,
      supplierSku: line.supplierSku || "—",
      description: line.name,
      quantity: quantityText(
        quantityToNumber(line.quantity),
        line.unit,
        line.unit === "pcs" ? 0 : 3,
      ),
      unitPrice: `${formatUnitCostText(line.unitPrice)} ${per}`,
      lineTotal: formatAmount(Number(cents) / 100),
      requestedDate: line.requestedDate ? formatDay(line.requestedDate) : "—",
      expectedDate: formatDay(line.expectedDate),
      priceNote:
        line.metalBasePerKg !== null && line.adderPerKg !== null
          ? `Metal base ${formatUnitCostText(line.metalBasePerKg)} + adder ${formatUnitCostText(line.adderPerKg)} ${input.currency}/kg, ${fixedAtWords[line.metalBaseFixedAt ?? "order"]}`
          : null,
      lineTotalCents: cents,
    };
  });
  const totalCents = rows.reduce((sum, row) => sum + row.lineTotalCents, 0n);
  const sendTo = input.supplier.orderEmail || input.supplier.email;
  return {
    title: `Purchase order ${input.number}`,
    company: input.company,
    number: input.number,
    facts: [
      { label: "Order number", value: input.number },
      {
        label: input.status === "draft" ? "Drafted on" : "Order date",
        value: formatDay(input.orderDate),
      },
      { label: "Supplier", value: input.supplier.name },
      ...(sendTo ? [{ label: "Supplier e-mail", value: sendTo }] : []),
      { label: "Currency", value: input.currency },
      { label: "Status", value: purchaseOrderStatusLabels[input.status] },
    ],
    rows,
    totalCents,
    totalText: formatQuantity(Number(totalCents) / 100, input.currency, 2),
    notes: input.notes.trim(),
  };
}

export type PurchaseOrderDocument = ReturnType<typeof purchaseOrderDocument>;

/** The CSV's header row: plain names a supplier's system can map. */
export const purchaseOrderCsvHeaders = [
  "line",
  "our_sku",
  "supplier_sku",
  "description",
  "quantity",
  "unit",
  "unit_price",
  "currency",
  "line_total",
  "requested_date",
  "expected_date",
] as const;

/** The CSV's rows: exact decimals as text ("25.000", "12.2000"), days as YYYY-MM-DD. */
export function purchaseOrderCsvRows(
  input: PurchaseOrderDocumentInput,
): CsvCell[][] {
  return input.lines.map((line) => [
    line.lineNumber,
    line.sku,
    line.supplierSku,
    line.name,
    formatQuantityText(line.quantity),
    line.unit,
    formatUnitCostText(line.unitPrice),
    input.currency,
    centsText(lineTotalCents(line.quantity, line.unitPrice)),
    line.requestedDate ?? "",
    line.expectedDate,
  ]);
}
