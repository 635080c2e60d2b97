/**
 * The revision's motor figures as text (a released revision, readers, the printed
 * BOM): its own module, without the form's Conform state, so pages that only show
 * the figures do not load it.
 */
import type { DesignPageData } from "~/designs/design-page.server";
import { insulationClassLabel } from "~/designs/insulation-classes";
import { DEFAULT_POLE_COVERAGE } from "~/designs/torque-estimate";
import { formatQuantity } from "~/lib/format";

type Revision = DesignPageData["revision"];

function Term({
  label,
  children,
}: {
  label: string;
  children: React.ReactNode;
}) {
  return (
    <div className="border-b border-graphite-100 py-1.5">
      <dt className="text-xs uppercase tracking-wide text-graphite-500">
        {label}
      </dt>
      <dd className="tabular-nums">{children}</dd>
    </div>
  );
}

const optional = (value: number | null, unit: string, decimals: number) =>
  value === null ? "not given" : formatQuantity(value, unit, decimals);

/** The revision's motor figures as text, for a released revision and for readers. */
export function DesignFieldsSummary({ revision }: { revision: Revision }) {
  return (
    <section aria-labelledby="motor-heading" className="panel">
      <h2 id="motor-heading" className="mb-2 text-lg font-semibold">
        Motor
      </h2>
      <dl className="grid grid-cols-2 gap-x-6 lg:grid-cols-4">
        <Term label="Poles">{formatQuantity(revision.poles, "")}</Term>
        <Term label="Slots">{formatQuantity(revision.slots, "")}</Term>
        <Term label="Rated current (RMS per phase)">
          {formatQuantity(revision.ratedCurrentA, "A", 2)}
        </Term>
        <Term label="Insulation class">
          {insulationClassLabel(revision.insulationClassC)}
        </Term>
        <Term label="Rated torque">
          {revision.ratedTorqueNm === null
            ? "not given"
            : `${formatQuantity(revision.ratedTorqueNm, "N·m", 3)} (${revision.torqueBasis})`}
        </Term>
        <Term label="Slot area">
          {optional(revision.slotAreaMm2, "mm²", 1)}
        </Term>
        <Term label="Slot liner and separator">
          {optional(revision.slotLinerAreaMm2, "mm²", 1)}
        </Term>
        <Term label="Coil sides per slot">
          {revision.coilSidesPerSlot === 1
            ? "1 (single layer)"
            : "2 (double layer)"}
        </Term>
        <Term label="Phases">{formatQuantity(revision.phases, "")}</Term>
        <Term label="Winding layers">
          {revision.windingLayers === 1
            ? "1 (single layer)"
            : "2 (double layer)"}
        </Term>
        <Term label="Phase connection">
          {revision.phaseConnection === "star" ? "star (wye)" : "delta"}
        </Term>
        <Term label="Parallel paths per phase">
          {formatQuantity(revision.parallelPaths, "")}
        </Term>
        <Term label="Rated speed">
          {optional(revision.ratedSpeedRpm, "rpm", 0)}
        </Term>
        <Term label="Air-gap radius">
          {optional(revision.airGapRadiusMm, "mm", 1)}
        </Term>
        <Term label="Air-gap flux density">
          {optional(revision.airGapFluxDensityT, "T", 3)}
        </Term>
        <Term label="Magnet arc ÷ pole pitch, α_p">
          {revision.poleCoverage === null
            ? `${formatQuantity(DEFAULT_POLE_COVERAGE, "", 1)} (default)`
            : formatQuantity(revision.poleCoverage, "", 3)}
        </Term>
      </dl>
      {revision.notes ? (
        <p className="mt-3 whitespace-pre-line text-sm text-graphite-700">
          {revision.notes}
        </p>
      ) : null}
    </section>
  );
}
