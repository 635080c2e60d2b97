import { Link } from "react-router";

/** An alert's state: open (a call to order), open but covered by a sent order, or closed. */
export function AlertState({
  status,
  coveredBy,
}: {
  status: "open" | "closed";
  coveredBy: { orderId: number; order: string; text: string } | null;
}) {
  if (status === "closed") {
    return <span className="text-xs text-graphite-500">Closed</span>;
  }
  if (!coveredBy) {
    return (
      <span className="rounded border border-copper-700 px-1.5 py-0.5 text-xs font-semibold text-copper-700">
        Open
      </span>
    );
  }
  const [before, after] = coveredBy.text.split(coveredBy.order);
  return (
    <span className="text-xs text-graphite-700">
      <span className="rounded border border-graphite-300 px-1.5 py-0.5 font-semibold text-graphite-700">
        Covered
      </span>{" "}
      {before}
      <Link
        to={`/purchase-orders/${coveredBy.orderId}`}
        className="font-medium text-copper-700 underline-offset-2 hover:underline"
      >
        {coveredBy.order}
      </Link>
      {after}
    </span>
  );
}
