/**
 * The actions at the head of a design revision: release (asked once, listing the checks
 * still open before the builder confirms), start the next revision, and, on a released
 * revision, create a build order of it. The build order is made by the build-order list's
 * own form action (`POST /build-orders`): one way to create one, whichever page starts it.
 */
import { Form, useFetcher } from "react-router";
import type { DesignPageData } from "~/designs/design-page.server";
import { designCheckNames } from "~/designs/design-checks";
import { maxMotorsPerOrder } from "~/build-orders/build-order-requirements";
import { ConfirmButton } from "~/components/confirm-button";
import type { DesignActionAnswer } from "./action-answer";

type Warning = DesignPageData["costing"]["warnings"][number];

export function StatusMark({ status }: { status: string }) {
  return status === "released" ? (
    <span className="inline-flex items-center gap-1 rounded-full border border-graphite-500 bg-graphite-100 px-2 py-0.5 text-xs font-semibold text-graphite-800">
      <svg viewBox="0 0 12 12" aria-hidden="true" className="h-3 w-3">
        <rect x="2" y="5.5" width="8" height="5.5" rx="1" fill="currentColor" />
        <path
          d="M3.8 5.5V4a2.2 2.2 0 0 1 4.4 0v1.5"
          fill="none"
          stroke="currentColor"
          strokeWidth="1.3"
        />
      </svg>
      Released
    </span>
  ) : (
    <span className="inline-flex items-center gap-1 rounded-full border border-dashed border-copper-500 bg-copper-50 px-2 py-0.5 text-xs font-semibold text-copper-700">
      Draft
    </span>
  );
}

/** The checks still open, by name and line, as the release confirmation lists them. */
function OpenChecks({ warnings }: { warnings: Warning[] }) {
  if (warnings.length === 0)
    return (
      <p className="text-sm text-graphite-700">
        Every check of the lines passes.
      </p>
    );
  return (
    <div className="text-sm">
      <p className="font-semibold text-caution">
        {warnings.length === 1
          ? "1 check is still open:"
          : `${warnings.length} checks are still open:`}
      </p>
      <ul aria-label="Checks still open" className="ml-4 list-disc">
        {warnings.map((warning) => (
          <li key={`${warning.line}-${warning.code}`} title={warning.message}>
            {designCheckNames[warning.code]}, line {warning.line} ({warning.sku}
            )
          </li>
        ))}
      </ul>
    </div>
  );
}

/**
 * Release, asked once in the shared confirmation dialog, which lists the checks still
 * open: it cannot be undone. Goes through a fetcher: the page turns read-only in place.
 */
export function ReleaseControl({
  revision,
  warnings,
}: {
  revision: number;
  warnings: Warning[];
}) {
  const fetcher = useFetcher<DesignActionAnswer>();
  const refused =
    fetcher.state === "idle" && fetcher.data && !fetcher.data.ok
      ? fetcher.data.message
      : null;
  return (
    <div className="space-y-2">
      <fetcher.Form method="post" aria-label={`Release revision ${revision}`}>
        <input type="hidden" name="intent" value="release" />
        <ConfirmButton
          className="button-quiet"
          disabled={fetcher.state !== "idle"}
          question={{
            title: `Release revision ${revision} for good?`,
            consequence: (
              <div className="space-y-2">
                <p>
                  Revision {revision} is locked: nobody can change it again,
                  later changes go into a new revision. Build orders use
                  released revisions only.
                </p>
                <OpenChecks warnings={warnings} />
              </div>
            ),
            confirmLabel: "Release for good",
            keepLabel: "Keep editing",
          }}
        >
          {fetcher.state !== "idle"
            ? "Releasing…"
            : `Release revision ${revision}…`}
        </ConfirmButton>
      </fetcher.Form>
      {refused ? (
        <p role="alert" className="max-w-md text-sm text-danger">
          {refused}
        </p>
      ) : null}
    </div>
  );
}

export function NewRevisionButton({ next }: { next: number }) {
  return (
    <Form method="post">
      <input type="hidden" name="intent" value="new-revision" />
      <button type="submit" className="button-primary">
        {`Start revision ${next}`}
      </button>
    </Form>
  );
}

/**
 * A build order of this released revision, through the build-order list's form action
 * (the same checks and messages; a refusal shows on that page's form, success opens the
 * new order).
 */
export function CreateBuildOrderForm({
  designId,
  revision,
  quantity,
}: {
  designId: number;
  revision: number;
  /** Motors to start with: the quantity the page is costed for. */
  quantity: number;
}) {
  return (
    <Form
      method="post"
      action="/build-orders"
      aria-label={`Create a build order of revision ${revision}`}
      className="flex items-end gap-2"
    >
      <input
        type="hidden"
        name="designRevision"
        value={`${designId}/${revision}`}
      />
      <div>
        <label htmlFor="build-order-quantity" className="field-label">
          Motors to build
        </label>
        <input
          id="build-order-quantity"
          name="quantity"
          type="number"
          min={1}
          max={maxMotorsPerOrder}
          step={1}
          inputMode="numeric"
          required
          defaultValue={quantity}
          className="field-input w-24 text-right tabular-nums"
        />
      </div>
      <button type="submit" className="button-quiet">
        Create build order
      </button>
    </Form>
  );
}
