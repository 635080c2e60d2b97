/** The item's catalogue entry for a buyer: rename it, archive it or restore it. */
import type { SubmissionResult } from "@conform-to/react";
import { Suspense } from "react";
import { Form, useNavigation } from "react-router";
import { ConfirmButton } from "~/components/confirm-button";
import type { FieldConstraints } from "~/components/forms/use-browser-validation";
import { RenameItemForm } from "./item-change-forms-lazy";

export function CatalogueEntryPanel({
  item,
  constraint,
  lastResult,
}: {
  item: { sku: string; name: string; active: boolean };
  /** The rename form's constraints, from the loader (getZodConstraint). */
  constraint: FieldConstraints;
  /** The answer to the last rename form sent, if that was the form sent. */
  lastResult: SubmissionResult<string[]> | undefined;
}) {
  const busy = useNavigation().state !== "idle";
  return (
    <section aria-labelledby="catalogue-heading" className="panel space-y-4">
      <h2 id="catalogue-heading" className="text-lg font-semibold">
        Catalogue entry
      </h2>
      <Suspense
        fallback={
          <p role="status" className="text-sm text-graphite-500">
            Opening the form…
          </p>
        }
      >
        <RenameItemForm
          name={item.name}
          constraint={constraint}
          lastResult={lastResult}
        />
      </Suspense>
      <Form method="post" className="border-t border-rule pt-4">
        <p className="mb-2 text-sm text-graphite-700">
          {item.active
            ? "Archiving hides the item from the stock list; its history stays."
            : "This item is archived: it shows in the stock list only with archived items included."}
        </p>
        {item.active ? (
          <ConfirmButton
            name="intent"
            value="archive"
            className="button-quiet"
            disabled={busy}
            question={{
              title: `Archive ${item.sku}?`,
              consequence: (
                <p>
                  {item.sku} no longer shows in the stock list unless archived
                  items are included; its stock, lots and history stay as they
                  are. Restore it here to bring it back.
                </p>
              ),
              confirmLabel: `Archive ${item.sku}`,
              keepLabel: "Keep it listed",
            }}
          >
            Archive item
          </ConfirmButton>
        ) : (
          <button
            type="submit"
            name="intent"
            value="restore"
            className="button-quiet"
            disabled={busy}
          >
            Restore item
          </button>
        )}
      </Form>
    </section>
  );
}
