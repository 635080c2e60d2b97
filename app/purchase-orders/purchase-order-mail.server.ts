/**
 * The e-mail that sends a purchase order to the supplier: a short text, the order as a PDF
 * and as CSV (`app/lib/csv-file.ts`), both built from the one printable content
 * (`purchase-order-document.ts`). Where it goes: the supplier's order address, else its
 * general one; with neither the order cannot be sent.
 */
import { eq } from "drizzle-orm";
import type { Database, Transaction } from "~/db/client.server";
import { settings } from "~/db/schema";
import { csvFile } from "~/lib/csv-file";
import { DomainError } from "~/lib/domain-error";
import type { OutgoingMail } from "~/mail/mailer.server";
import type { PurchaseOrderView } from "./purchase-order-details.server";
import {
  purchaseOrderCsvHeaders,
  purchaseOrderCsvRows,
  purchaseOrderDocument,
  type PurchaseOrderDocumentInput,
} from "./purchase-order-document";
import { purchaseOrderPdf } from "./purchase-order-pdf.server";

/** The company's name on printed orders (setting company_name). */
export const defaultCompanyName = "Turnledger workshop";

export async function companyName(
  reader: Database | Transaction,
): Promise<string> {
  const [row] = await reader
    .select({ value: settings.value })
    .from(settings)
    .where(eq(settings.key, "company_name"))
    .limit(1);
  return row?.value || defaultCompanyName;
}

/** The supplier's address for orders; 422 naming the supplier when it has none. */
export function orderAddressOf(supplier: {
  name: string;
  orderEmail: string | null;
  email: string | null;
}): string {
  const address = supplier.orderEmail?.trim() || supplier.email?.trim();
  if (!address)
    throw new DomainError(
      422,
      `${supplier.name} has no order e-mail address and no general e-mail address: add one on the supplier's page, then send the order.`,
      "supplier",
    );
  return address;
}

/** The order as the document's input. */
export function documentInputOf(
  order: PurchaseOrderView,
  company: string,
): PurchaseOrderDocumentInput {
  return {
    company,
    number: order.number,
    status: order.status,
    currency: order.currency,
    notes: order.notes,
    orderDate: order.orderDate,
    supplier: order.supplier,
    lines: order.lines,
  };
}

/** The order's e-mail with its PDF and CSV attached. */
export async function purchaseOrderMail(
  order: PurchaseOrderView,
  company: string,
  to: string,
): Promise<OutgoingMail> {
  const input = documentInputOf(order, company);
  const document = purchaseOrderDocument(input);
  const pdf = await purchaseOrderPdf(document, order.sentAt ?? new Date());
  const csv = csvFile(purchaseOrderCsvHeaders, purchaseOrderCsvRows(input));
  const lineCount = order.lines.length;
  const text = [
    `Hello ${order.supplier.name},`,
    "",
    `please find our purchase order ${order.number} attached as a PDF and as CSV: ${lineCount} ${lineCount === 1 ? "line" : "lines"}, total ${document.totalText}.`,
    ...(document.notes ? ["", `Notes: ${document.notes}`] : []),
    "",
    "Please confirm the order and its delivery dates.",
    "",
    company,
  ].join("\n");
  return {
    to,
    subject: `Purchase order ${order.number} from ${company}`,
    text,
    attachments: [
      {
        fileName: `${order.number}.pdf`,
        contentType: "application/pdf",
        content: pdf,
      },
      {
        fileName: `${order.number}.csv`,
        contentType: "text/csv; charset=utf-8",
        content: Buffer.from(csv, "utf8"),
      },
    ],
  };
}
