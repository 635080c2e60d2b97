/**
 * The purchase order as a PDF (pdfkit, pinned in package.json), from the same content as
 * the print page (`purchase-order-document.ts`). Only the PDF standard fonts (Helvetica),
 * whose metrics ship inside pdfkit: nothing is read from the network, and no font file is
 * embedded. A4 portrait, one table; long orders run onto further pages with the header
 * row repeated.
 */
import PDFDocument from "pdfkit";
import type { PurchaseOrderDocument } from "./purchase-order-document";

const margin = 40;
const pageWidth = 595.28; // A4 in points
const pageHeight = 841.89;
const usable = pageWidth - 2 * margin;

/** Column widths in points (sum = usable width) and alignment. */
const columns = [
  { key: "line", label: "#", width: 20, align: "left" },
  { key: "sku", label: "Our SKU", width: 62, align: "left" },
  { key: "supplierSku", label: "Supplier SKU", width: 62, align: "left" },
  { key: "description", label: "Description", width: 106, align: "left" },
  { key: "quantity", label: "Quantity", width: 56, align: "right" },
  { key: "unitPrice", label: "Unit price", width: 80, align: "right" },
  { key: "lineTotal", label: "Line total", width: 52, align: "right" },
  {
    key: "dates",
    label: "Requested / expected",
    width: usable - 438,
    align: "right",
  },
] as const;

type RowTexts = Record<(typeof columns)[number]["key"], string>;

/** The order's PDF bytes. */
export function purchaseOrderPdf(
  document: PurchaseOrderDocument,
  createdAt: Date,
): Promise<Buffer> {
  const pdf = new PDFDocument({
    size: "A4",
    margin,
    info: {
      Title: document.title,
      Author: document.company,
      Subject: document.title,
      CreationDate: createdAt,
    },
  });
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolve, reject) => {
    pdf.on("data", (chunk: Buffer) => chunks.push(chunk));
    pdf.on("end", () => resolve(Buffer.concat(chunks)));
    pdf.on("error", reject);
  });

  pdf
    .font("Helvetica-Bold")
    .fontSize(16)
    .text(document.company, margin, margin);
  pdf.fontSize(13).text(document.title);
  pdf.moveDown(0.5);
  pdf.font("Helvetica").fontSize(9);
  for (const fact of document.facts) {
    pdf.font("Helvetica-Bold").text(`${fact.label}: `, { continued: true });
    pdf.font("Helvetica").text(fact.value);
  }
  pdf.moveDown(1);

  const drawRow = (texts: RowTexts, bold: boolean) => {
    pdf.font(bold ? "Helvetica-Bold" : "Helvetica").fontSize(8);
    const heights = columns.map((column) =>
      pdf.heightOfString(texts[column.key], { width: column.width - 4 }),
    );
    const height = Math.max(...heights) + 4;
    if (pdf.y + height > pageHeight - margin - 40) {
      pdf.addPage();
      if (!bold) drawRow(headerTexts, true);
      // The header row leaves its bold face behind.
      pdf.font(bold ? "Helvetica-Bold" : "Helvetica").fontSize(8);
    }
    const top = pdf.y;
    let x = margin;
    for (const column of columns) {
      pdf.text(texts[column.key], x + 2, top + 2, {
        width: column.width - 4,
        align: column.align,
      });
      x += column.width;
    }
    pdf
      .moveTo(margin, top + height)
      .lineTo(margin + usable, top + height)
      .lineWidth(bold ? 0.8 : 0.3)
      .stroke();
    pdf.x = margin;
    pdf.y = top + height + 1;
  };
  const headerTexts = Object.fromEntries(
    columns.map((column) => [column.key, column.label]),
  ) as RowTexts;

  drawRow(headerTexts, true);
  for (const row of document.rows) {
    drawRow(
      {
        line: row.line,
        sku: row.sku,
        supplierSku: row.supplierSku,
        description: row.priceNote
          ? `${row.description}\n${row.priceNote}`
          : row.description,
        quantity: row.quantity,
        unitPrice: row.unitPrice,
        lineTotal: row.lineTotal,
        dates: `${row.requestedDate} / ${row.expectedDate}`,
      },
      false,
    );
  }
  pdf.moveDown(0.5);
  pdf
    .font("Helvetica-Bold")
    .fontSize(10)
    .text(`Total: ${document.totalText}`, margin, pdf.y, {
      width: usable,
      align: "right",
    });
  if (document.notes) {
    pdf.moveDown(1);
    pdf.font("Helvetica-Bold").fontSize(9).text("Notes", margin);
    pdf.font("Helvetica").text(document.notes, { width: usable });
  }
  pdf.end();
  return done;
}
