/** The printable order from its document: the company and number, the facts, the lines, the total and the notes. */
import type { PurchaseOrderDocument } from "~/purchase-orders/purchase-order-document";
import { purchaseOrderColumns } from "~/purchase-orders/purchase-order-document";
import { TableScroll } from "~/components/table-scroll";

const numericKeys = new Set(["line", "quantity", "unitPrice", "lineTotal"]);

export function PurchaseOrderSheet({
  document,
}: {
  document: PurchaseOrderDocument;
}) {
  return (
    <article className="space-y-6 rounded-lg border border-rule bg-sheet p-4 sm:p-8 print:border-0 print:p-0">
      <header className="flex flex-wrap items-start justify-between gap-4 border-b border-rule pb-4">
        <div>
          <p className="text-sm text-graphite-500">{document.company}</p>
          <h1 className="text-2xl font-semibold">{document.title}</h1>
        </div>
        <dl className="grid grid-cols-[auto_auto] gap-x-4 gap-y-1 text-sm">
          {document.facts.map((fact) => (
            <div key={fact.label} className="contents">
              <dt className="text-graphite-500">{fact.label}</dt>
              <dd className="font-medium">{fact.value}</dd>
            </div>
          ))}
        </dl>
      </header>
      <TableScroll label={`Lines of ${document.number}`}>
        <table className="data-table">
          <caption className="sr-only">Lines of {document.number}</caption>
          <thead>
            <tr>
              {purchaseOrderColumns.map((column) => (
                <th
                  key={column.key}
                  scope="col"
                  className={numericKeys.has(column.key) ? "text-right" : ""}
                >
                  {column.label}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {document.rows.map((row) => (
              <tr key={row.line} className="break-inside-avoid">
                {purchaseOrderColumns.map((column) => (
                  <td
                    key={column.key}
                    className={
                      numericKeys.has(column.key)
                        ? "text-right whitespace-nowrap"
                        : ""
                    }
                  >
                    {row[column.key]}
                    {column.key === "description" && row.priceNote ? (
                      <span className="block text-xs text-graphite-500">
                        {row.priceNote}
                      </span>
                    ) : null}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
          <tfoot>
            <tr>
              <th scope="row" colSpan={6} className="text-right">
                Total
              </th>
              <td className="text-right font-semibold whitespace-nowrap">
                {document.totalText}
              </td>
              <td colSpan={2} />
            </tr>
          </tfoot>
        </table>
      </TableScroll>
      {document.notes ? (
        <section className="text-sm">
          <h2 className="font-semibold">Notes</h2>
          <p className="whitespace-pre-line">{document.notes}</p>
        </section>
      ) : null}
    </article>
  );
}
