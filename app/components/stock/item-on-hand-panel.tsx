/** The item's on hand over time, as a chart. */
import { lazyFigure } from "~/components/lazy-figure";
import type { OnHandPoint } from "~/stock/on-hand-history-chart";

const OnHandChart = lazyFigure(
  () =>
    import("~/components/on-hand-chart").then((module) => module.OnHandChart),
  { aspectRatio: "720 / 250" },
);

export function ItemOnHandPanel(props: {
  points: OnHandPoint[];
  now: string;
  unit: string;
  reorderPoint: number;
}) {
  return (
    <section aria-labelledby="chart-heading" className="panel">
      <h2 id="chart-heading" className="mb-3 text-lg font-semibold">
        On hand over time
      </h2>
      <OnHandChart {...props} />
    </section>
  );
}
