/**
 * Step 4 of a price-list import, once done: what was imported (or that the
 * file was imported before), a link to the import, and its warnings.
 */
import { Link } from "react-router";
import type { PriceListImport } from "~/components/price-import/price-list-upload";
import { formatQuantity } from "~/lib/format";
import { ImportWarnings } from "./import-warnings";

export function ImportDone({ result }: { result: PriceListImport }) {
  const link = `/suppliers/imports?import=${result.importId}`;
  if (result.alreadyImported)
    return (
      <div
        role="status"
        className="rounded-md border border-field/40 bg-field/5 px-4 py-3"
      >
        <p className="font-medium text-field">
          Already imported, nothing changed.
        </p>
        <p className="mt-1 text-sm text-graphite-700">
          This supplier&apos;s file was imported before with the same content.{" "}
          <Link to={link} className="text-copper-700 underline">
            See that import
          </Link>
        </p>
      </div>
    );
  return (
    <div
      role="status"
      className="rounded-md border border-ok/40 bg-ok/10 px-4 py-3"
    >
      <p className="font-medium text-ok">
        Imported {formatQuantity(result.rows, "")} rows from {result.fileName}{" "}
        for {result.supplier}.
      </p>
      <p className="mt-1 text-sm text-graphite-700">
        {result.newItems === 0
          ? "Every row matched an existing catalogue item."
          : result.newItems === 1
            ? "1 new catalogue item was created."
            : `${result.newItems} new catalogue items were created.`}{" "}
        <Link to={link} className="text-copper-700 underline">
          See the import
        </Link>
      </p>
      <div className="mt-3">
        <ImportWarnings warnings={result.warnings} />
      </div>
    </div>
  );
}
