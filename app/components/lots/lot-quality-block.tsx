/**
 * The lot's hold (quality block) as it stands, in words; for those who may hold lots, the
 * form that holds a free lot or releases a held one, with the reason (the hold and release
 * routes answer it).
 */
import type { SubmissionResult } from "@conform-to/react";
import { useFetcher } from "react-router";
import { formatDateTime } from "~/lib/format";
import type { LotDetails } from "~/lots/lot-details.server";

export function LotQualityBlock({
  lot,
  canHold,
}: {
  lot: LotDetails;
  canHold: boolean;
}) {
  const held = lot.hold;
  // A fetcher, so a refusal (400 field error, 409 lot already held or free) is shown here;
  // success redirects back to this page with its one-time message.
  const fetcher = useFetcher<{ step: string; result: SubmissionResult }>();
  const errors = fetcher.data?.result.error ?? {};
  const refusal = [...(errors[""] ?? []), ...(errors.reason ?? [])].join(" ");
  return (
    <section
      aria-labelledby="hold-heading"
      className={`panel text-sm ${held ? "border-danger/50 bg-danger/5" : ""}`}
    >
      <h2 id="hold-heading" className="mb-2 text-lg font-semibold">
        Quality hold
      </h2>
      {held ? (
        <p>
          <strong className="text-danger">On hold</strong> since{" "}
          {formatDateTime(held.since)}
          {held.by ? ` by ${held.by}` : ""}: {held.reason}. It cannot be issued
          or reserved until it is released.
        </p>
      ) : (
        <p>Free: not on hold.</p>
      )}
      {canHold ? (
        <fetcher.Form
          method="post"
          action={`/stock/lots/${lot.id}/${held ? "release" : "hold"}`}
          className="mt-3 space-y-2"
        >
          <div>
            <label htmlFor="hold-reason" className="field-label">
              {held ? "Why it is released" : "Why it is held"}
            </label>
            <input
              id="hold-reason"
              name="reason"
              className="field-input"
              required={!held}
              maxLength={300}
              autoComplete="off"
              aria-invalid={refusal ? true : undefined}
              aria-describedby={refusal ? "hold-refusal" : undefined}
            />
            {refusal ? (
              <p id="hold-refusal" role="alert" className="field-error">
                {refusal}
              </p>
            ) : null}
          </div>
          <button type="submit" className="button-quiet">
            {held ? "Release the lot" : "Put on hold"}
          </button>
        </fetcher.Form>
      ) : null}
    </section>
  );
}
