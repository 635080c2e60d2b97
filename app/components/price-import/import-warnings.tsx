/**
 * What the import warns of without holding it back: a currency with no rate, a
 * wire list with no metal base in its currency (see price-import-warnings.ts).
 */
import type { PriceImportWarning } from "~/purchasing/price-import-warnings";

export function ImportWarnings({
  warnings,
}: {
  warnings: readonly PriceImportWarning[];
}) {
  if (warnings.length === 0) return null;
  return (
    <section
      aria-labelledby="import-warnings-heading"
      className="rounded-md border border-caution/40 bg-caution/5 px-4 py-3"
    >
      <h3 id="import-warnings-heading" className="font-semibold text-caution">
        Warnings
      </h3>
      <p className="text-sm text-graphite-700">
        The rows can be imported; these prices will lack something until it is
        entered.
      </p>
      <ul className="mt-1 list-disc pl-5 text-sm text-graphite-900">
        {warnings.map((warning) => (
          <li key={warning.message}>{warning.message}</li>
        ))}
      </ul>
    </section>
  );
}
