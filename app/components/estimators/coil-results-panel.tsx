import { lazy, Suspense, useEffect } from "react";
import type { CoilEstimate } from "~/engineering/coil-estimate";
import type { CoilEstimateRequest } from "~/lib/estimate-requests";

/**
 * The figures' code (and the coil model it splits the conductor with) is not
 * first-load JavaScript: it is loaded once the page runs, before the first estimate
 * is back (docs/decisions/051-precompressed-assets-and-page-weight.md).
 */
const loadFigures = () => import("./coil-result-figures");
const CoilResultFigures = lazy(loadFigures);

function Calculating() {
  return (
    <p className="text-sm text-graphite-500" aria-live="polite">
      Calculating…
    </p>
  );
}

/** The last good coil estimate: where the conductor goes, and the figures; "Calculating…" until the first. */
export function CoilResultsPanel({
  lastGood,
  pending,
}: {
  lastGood: { estimate: CoilEstimate; input: CoilEstimateRequest } | null;
  /** A newer estimate is being worked out, or the input was refused: the figures are dimmed. */
  pending: boolean;
}) {
  useEffect(() => {
    void loadFigures();
  }, []);
  return (
    /* Busy until the first estimate is back; the results then say when a newer one is being worked out. */
    <div className="panel" aria-busy={lastGood ? undefined : true}>
      {lastGood ? (
        <Suspense fallback={<Calculating />}>
          <CoilResultFigures lastGood={lastGood} pending={pending} />
        </Suspense>
      ) : (
        <Calculating />
      )}
    </div>
  );
}
