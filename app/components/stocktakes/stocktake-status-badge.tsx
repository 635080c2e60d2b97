import type { StocktakeStatus } from "~/db/tables/storeroom-enums";
import { stocktakeStatusLabels } from "~/stocktakes/stocktake-reference";

const tones: Record<StocktakeStatus, string> = {
  counting: "border-copper-300 bg-copper-50 text-copper-700",
  approved: "border-ok/40 bg-ok/5 text-ok",
  cancelled: "border-graphite-300 bg-sheet text-graphite-700",
};

export function StocktakeStatusBadge({ status }: { status: StocktakeStatus }) {
  return (
    <span
      className={`inline-block rounded-full border px-2 py-0.5 text-xs font-medium whitespace-nowrap ${tones[status]}`}
    >
      {stocktakeStatusLabels[status]}
    </span>
  );
}
