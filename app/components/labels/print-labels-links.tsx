/**
 * "Print labels" after a receipt: the lots just received, each with its label for the label
 * printer, and all of them on an A4 sheet. Shown only to those who may print labels.
 */
import { Link } from "react-router";

const linkClass =
  "font-medium text-copper-700 underline underline-offset-2 hover:text-copper-800";

export function PrintLabelsLinks({
  lots,
  sheetHref,
}: {
  lots: { lotId: number; lotNumber: string; sku: string }[];
  /** All the lots' labels on one page (the delivery's, or the ids). */
  sheetHref: string;
}) {
  if (lots.length === 0) return null;
  return (
    <section
      aria-labelledby="print-labels-heading"
      className="rounded-md border border-copper-300 bg-copper-50/40 px-4 py-3"
    >
      <h2 id="print-labels-heading" className="font-semibold">
        Print labels
      </h2>
      <p className="text-sm text-graphite-700">
        Label what was just received before it goes on the shelf.
      </p>
      <ul className="mt-2 flex flex-wrap gap-x-5 gap-y-1 text-sm">
        {lots.length > 1 ? (
          <li>
            <Link
              to={`${sheetHref}${sheetHref.includes("?") ? "&" : "?"}size=a4`}
              className={linkClass}
            >
              All {lots.length} labels on an A4 sheet
            </Link>
          </li>
        ) : null}
        {lots.map((lot) => (
          <li key={lot.lotId}>
            <Link
              to={`/labels/lots/${lot.lotId}?size=62x100`}
              className={linkClass}
            >
              Label of lot {lot.lotNumber} ({lot.sku})
            </Link>
          </li>
        ))}
      </ul>
    </section>
  );
}
