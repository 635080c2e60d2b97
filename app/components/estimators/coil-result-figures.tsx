/**
 * The figures of the last good coil estimate: where the conductor goes, then the
 * coil's and the operating figures. Loaded with import() by CoilResultsPanel (they
 * show only once an estimate has come back, after the page has run).
 */
import { conductorSplit, type CoilEstimate } from "~/engineering/coil-estimate";
import type { CoilEstimateRequest } from "~/lib/estimate-requests";
import { CoilOperatingResults } from "./coil-operating-results";
import { CoilResults } from "./coil-results";
import { ConductorSplitBar } from "./conductor-split-bar";

export default function CoilResultFigures({
  lastGood,
  pending,
}: {
  lastGood: { estimate: CoilEstimate; input: CoilEstimateRequest };
  pending: boolean;
}) {
  return (
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
  );
}
