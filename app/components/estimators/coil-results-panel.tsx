import { conductorSplit, type CoilEstimate } from "~/engineering/coil-estimate";
import type { CoilEstimateRequest } from "~/lib/estimate-requests";
import { CoilOperatingResults } from "./coil-operating-results";
import { CoilResults } from "./coil-results";
import { ConductorSplitBar } from "./conductor-split-bar";

/** The last good coil estimate: where the conductor goes, and the figures; "Calculating…" until the first. */
export function CoilResultsPanel({
  lastGood,
  pending,
}: {
  lastGood: { estimate: CoilEstimate; input: CoilEstimateRequest } | null;
  /** A newer estimate is being worked out, or the input was refused: the figures are dimmed. */
  pending: boolean;
}) {
  return (
    /* Busy until the first estimate is back; the results then say when a newer one is being worked out. */
    <div className="panel" aria-busy={lastGood ? undefined : true}>
      {lastGood ? (
        <div className="space-y-6">
          <ConductorSplitBar split={conductorSplit(lastGood.input)} />
          <CoilResults
            estimate={lastGood.estimate}
            coilCount={lastGood.input.coilCount}
            temperatureC={lastGood.input.temperatureC}
            pending={pending}
          />
          <CoilOperatingResults
            estimate={lastGood.estimate}
            coilCount={lastGood.input.coilCount}
            temperatureC={lastGood.input.temperatureC}
          />
        </div>
      ) : (
        <p className="text-sm text-graphite-500" aria-live="polite">
          Calculating…
        </p>
      )}
    </div>
  );
}
