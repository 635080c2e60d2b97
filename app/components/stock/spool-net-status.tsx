/**
 * A spool's net weight (gross − tare) as its weights are typed, or why it cannot be: shown
 * on the receipt forms (the record page's and receiving against an order). Nothing until
 * both weights are numbers.
 */
import { formatQuantity } from "~/lib/format";
import { spoolNetKg } from "~/stock/spool-net-weight";

export function SpoolNetStatus({
  gross,
  tare,
  className = "rounded-md bg-graphite-50 px-4 py-3 sm:col-span-2",
}: {
  /** The gross and tare as typed. */
  gross: string;
  tare: string;
  className?: string;
}) {
  const net = spoolNetKg(gross, tare);
  if (net === null) return null;
  return (
    <p role="status" className={className}>
      {net > 0 ? (
        <>
          Net weight (gross − tare):{" "}
          <strong className="tabular-nums">
            {formatQuantity(net, "kg", 3)}
          </strong>
        </>
      ) : (
        <span className="text-danger">
          Net weight (gross − tare) is {formatQuantity(net, "kg", 3)}: the gross
          weight must be more than the tare weight.
        </span>
      )}
    </p>
  );
}
