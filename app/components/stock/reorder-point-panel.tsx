/**
 * The item's reorder point and quantity: a form for those who may set them, else the
 * figures in a sentence (also what shows while the form's code is on its way after a
 * navigation in the browser).
 */
import type { SubmissionResult } from "@conform-to/react";
import { Suspense } from "react";
import type { FieldConstraints } from "~/components/forms/use-browser-validation";
import { formatStockQuantity } from "~/stock/stock-quantity-text";
import { ReorderPointForm } from "./item-change-forms-lazy";

export function ReorderPointPanel({
  item,
  canSet,
  constraint,
  lastResult,
}: {
  item: { unit: string; reorderPoint: number; reorderQuantity: number };
  canSet: boolean;
  /** The reorder form's constraints, from the loader (getZodConstraint). */
  constraint: FieldConstraints;
  /** The answer to the last reorder form sent, if that was the form sent. */
  lastResult: SubmissionResult<string[]> | undefined;
}) {
  const unit = item.unit;
  const figures = (
    <section aria-labelledby="reorder-heading" className="panel text-sm">
      <h2 id="reorder-heading" className="mb-2 text-lg font-semibold">
        Reorder point
      </h2>
      <p>
        {item.reorderPoint > 0
          ? `${formatStockQuantity(item.reorderPoint, unit)}; order ${formatStockQuantity(item.reorderQuantity, unit)} at a time.`
          : "Not set."}
      </p>
    </section>
  );
  if (!canSet) return figures;
  return (
    <Suspense fallback={figures}>
      <ReorderPointForm
        item={item}
        constraint={constraint}
        lastResult={lastResult}
      />
    </Suspense>
  );
}
