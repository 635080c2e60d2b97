import type { DesignPageData } from "~/designs/design-page.server";
import type { Figure as Maybe } from "~/designs/winding-figures";
import { formatQuantity } from "~/lib/format";

type WindingFigures = DesignPageData["costing"]["winding"];

/** One figure of the panel: its name, its value with the unit, and a line of explanation. */
function WindingFigure({
  label,
  figure,
  show,
  children,
}: {
  label: string;
  figure: Maybe<unknown>;
  show: () => React.ReactNode;
  children?: React.ReactNode;
}) {
  const available = "value" in figure;
  return (
    <div
      role="group"
      aria-label={label}
      className="rounded-md border border-rule bg-white/60 px-4 py-3"
    >
      <dl>
        <dt className="text-xs font-medium uppercase tracking-wide text-graphite-500">
          {label}
        </dt>
        <dd className="mt-1 text-xl font-semibold tabular-nums">
          {available ? show() : "—"}
        </dd>
        <dd className="mt-1 text-xs text-graphite-500">
          {available ? children : figure.unavailable}
        </dd>
      </dl>
    </div>
  );
}

const temperaturesText = (temperatures: number[]) =>
  temperatures.map((t) => formatQuantity(t, "°C", 0)).join(", ");

/** The revision's winding: factor, Kt, line-to-line Ke and resistance, electrical frequency. */
export function WindingPanel({ winding }: { winding: WindingFigures }) {
  const { windingFactor, constants, resistance, electricalFrequency } = winding;
  const layout = winding.winding;
  return (
    <section aria-labelledby="winding-heading" className="panel space-y-4">
      <div>
        <h2 id="winding-heading" className="text-lg font-semibold">
          Winding and motor constants
        </h2>
        <p className="text-sm text-graphite-600">
          {layout.slots} slots, {layout.poles} poles, {layout.phases}{" "}
          {layout.phases === 1 ? "phase" : "phases"},{" "}
          {layout.layers === 2 ? "double" : "single"} layer,{" "}
          {layout.connection === "star" ? "star" : "delta"},{" "}
          {layout.parallelPaths === 1
            ? "one path"
            : `${layout.parallelPaths} parallel paths`}
          . {winding.currentBasis}
        </p>
        {winding.coilCountNote ? (
          <p role="note" className="mt-1 text-sm text-caution">
            {winding.coilCountNote}
          </p>
        ) : null}
      </div>
      <div className="grid gap-3 sm:grid-cols-2 xl:grid-cols-3">
        <WindingFigure
          label="Fundamental winding factor"
          figure={windingFactor}
          show={() =>
            "value" in windingFactor &&
            formatQuantity(windingFactor.value.fundamental, "", 3)
          }
        >
          {"value" in windingFactor
            ? `Star of slots; ${windingFactor.value.kind === "concentrated" ? "tooth coils" : "distributed"}, coil pitch ${windingFactor.value.coilPitch} ${windingFactor.value.coilPitch === 1 ? "slot" : "slots"}. Harmonics: 5th ${formatQuantity(windingFactor.value.harmonics.find((h) => h.order === 5)?.factor ?? 0, "", 3)}, 7th ${formatQuantity(windingFactor.value.harmonics.find((h) => h.order === 7)?.factor ?? 0, "", 3)}.`
            : null}
        </WindingFigure>
        <WindingFigure
          label="Torque constant Kt"
          figure={constants}
          show={() =>
            "value" in constants &&
            formatQuantity(constants.value.ktNmPerA, "N·m/A", 3)
          }
        >
          {"value" in constants
            ? `Per A RMS phase current${layout.connection === "delta" ? `; ${formatQuantity(constants.value.ktLineNmPerA, "N·m/A", 3)} per A RMS line current` : ""}. ${formatQuantity(constants.value.seriesTurnsPerPhase, "", 0)} series turns per phase.`
            : null}
        </WindingFigure>
        <WindingFigure
          label="Back-EMF constant Ke, line to line"
          figure={constants}
          show={() =>
            "value" in constants &&
            formatQuantity(
              constants.value.keLineToLineRmsVsPerRad,
              "V·s/rad",
              4,
            )
          }
        >
          {"value" in constants
            ? `RMS; peak ${formatQuantity(constants.value.keLineToLinePeakVsPerRad, "V·s/rad", 4)}, or ${formatQuantity((constants.value.keLineToLineRmsVsPerRad * 2 * Math.PI * 1000) / 60, "V", 1)} RMS per 1000 rpm.`
            : null}
        </WindingFigure>
        <WindingFigure
          label="Resistance line to line, 20 °C"
          figure={resistance}
          show={() =>
            "value" in resistance &&
            formatQuantity(resistance.value.lineToLine20Ohm, "Ω", 4)
          }
        >
          {"value" in resistance
            ? `Phase ${formatQuantity(resistance.value.phase20Ohm, "Ω", 4)}; coils with their leads.`
            : null}
        </WindingFigure>
        <WindingFigure
          label="Resistance line to line, hot"
          figure={resistance}
          show={() =>
            "value" in resistance &&
            formatQuantity(resistance.value.lineToLineHotOhm, "Ω", 4)
          }
        >
          {"value" in resistance
            ? `At the coils' operating temperature (${temperaturesText(resistance.value.operatingTemperaturesC)}); phase ${formatQuantity(resistance.value.phaseHotOhm, "Ω", 4)}.`
            : null}
        </WindingFigure>
        <WindingFigure
          label="Electrical frequency at rated speed"
          figure={electricalFrequency}
          show={() =>
            "value" in electricalFrequency &&
            formatQuantity(electricalFrequency.value, "Hz", 1)
          }
        >
          f = p · n / 60, p = {layout.poles / 2} pole pairs.
        </WindingFigure>
      </div>
    </section>
  );
}
