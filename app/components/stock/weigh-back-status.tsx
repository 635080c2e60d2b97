/**
 * What a weighed-back spool issues, shown as its gross weight is typed: the amount (and
 * the most wire that can be), what the spool held and holds now; or that there is
 * nothing to issue.
 */
import { formatQuantity } from "~/lib/format";
import type { WeighBackPreview } from "~/stock/weigh-back-preview";

export function WeighBackStatus({
  preview,
  previousNetKg,
  metresPerKg,
}: {
  preview: WeighBackPreview;
  /** What the spool held, kg net (the lot's on hand). */
  previousNetKg: number;
  /** Bare metres per kg of the wire; null when its size is not known. */
  metresPerKg: number | null;
}) {
  const { issueKg, netNowKg } = preview;
  return (
    <p role="status" className="rounded-md bg-graphite-50 px-4 py-3">
      {issueKg > 0 ? (
        <>
          Issue <strong>{formatQuantity(issueKg, "kg", 3)}</strong>
          {metresPerKg ? (
            <>
              {" "}
              ≈ up to {formatQuantity(issueKg * metresPerKg, "m", 0)} of wire
            </>
          ) : null}
          : the spool held {formatQuantity(previousNetKg, "kg", 3)} net and now
          holds {formatQuantity(netNowKg, "kg", 3)}.
        </>
      ) : (
        <span className="text-danger">
          The spool weighs as much as or more than its recorded net: nothing to
          issue.
        </span>
      )}
    </p>
  );
}
