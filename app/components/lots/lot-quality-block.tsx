/**
 * The lot's hold (quality block) as it stands, in words; for those who may hold lots, the
 * form that holds a free lot or releases a held one, with the reason (the hold and release
 * routes answer it).
 */
import { Form } from "react-router";
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
        <Form
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
              required
              maxLength={300}
              autoComplete="off"
            />
          </div>
          <button type="submit" className="button-quiet">
            {held ? "Release the lot" : "Put on hold"}
          </button>
        </Form>
      ) : null}
    </section>
  );
}
