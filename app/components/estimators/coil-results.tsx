import { useState } from "react";
import type { CoilEstimate, CoilQuantities } from "~/engineering/coil-estimate";
import { kgToPounds, metresToFeet, mmToInches } from "~/engineering/units";
import { formatQuantity } from "~/lib/format";
import { TableScroll } from "~/components/table-scroll";

type UnitSystem = "metric" | "imperial";

function length(metres: number, units: UnitSystem) {
  return units === "metric"
    ? formatQuantity(metres, "m", 3)
    : formatQuantity(metresToFeet(metres), "ft", 2);
}
function mass(kg: number, units: UnitSystem) {
  return units === "metric"
    ? formatQuantity(kg * 1000, "g", 2)
    : formatQuantity(kgToPounds(kg), "lb", 4);
}
function smallLength(mm: number | null, units: UnitSystem) {
  if (mm === null) return "—";
  return units === "metric"
    ? formatQuantity(mm, "mm", 4)
    : formatQuantity(mmToInches(mm), "in", 5);
}
const ohms = (value: number) => formatQuantity(value, "Ω", value < 1 ? 5 : 3);

const quantityRows: {
  label: string;
  render: (q: CoilQuantities, units: UnitSystem) => string;
}[] = [
  { label: "Conductor wound", render: (q, u) => length(q.conductorLengthM, u) },
  {
    label: "Conductor drawn from stock (with scrap)",
    render: (q, u) => length(q.purchasedLengthM, u),
  },
  {
    label: "Mass wound (bare conductor)",
    render: (q, u) => mass(q.woundMassKg, u),
  },
  {
    label: "Mass drawn from stock",
    render: (q, u) => mass(q.purchasedMassKg, u),
  },
  { label: "Resistance at 20 °C", render: (q) => ohms(q.resistance20Ohm) },
  {
    label: "Resistance at operating temperature",
    render: (q) => ohms(q.resistanceOhm),
  },
  {
    label: "Conductor in the field (makes force)",
    render: (q, u) => length(q.forceLengthM, u),
  },
];

/** The estimate as a table, per coil and for all coils, in metric or imperial units. */
export function CoilResults({
  estimate,
  coilCount,
  temperatureC,
  pending,
}: {
  estimate: CoilEstimate;
  coilCount: number;
  temperatureC: number;
  pending: boolean;
}) {
  const [units, setUnits] = useState<UnitSystem>("metric");
  return (
    <section
      aria-labelledby="results-heading"
      className={`space-y-4 ${pending ? "opacity-70" : ""}`}
      aria-busy={pending}
    >
      <div className="flex items-center justify-between gap-4">
        <h2 id="results-heading" className="text-lg font-semibold">
          Results
        </h2>
        <fieldset className="flex rounded-md border border-graphite-300 text-sm print:hidden">
          <legend className="sr-only">Units</legend>
          {(["metric", "imperial"] as const).map((system) => (
            <label
              key={system}
              className={`cursor-pointer px-3 py-1 ${units === system ? "bg-graphite-800 text-white" : ""}`}
            >
              <input
                type="radio"
                name="units"
                value={system}
                checked={units === system}
                onChange={() => setUnits(system)}
                className="sr-only"
              />
              {system === "metric" ? "Metric" : "Imperial"}
            </label>
          ))}
        </fieldset>
      </div>
      <dl className="grid grid-cols-2 gap-3 text-sm sm:grid-cols-4">
        <div className="rounded-md border border-rule bg-white p-3">
          <dt className="text-graphite-500">
            {estimate.wire.kind === "round"
              ? "Bare diameter"
              : "Diameter of equal copper"}
          </dt>
          <dd className="font-semibold">
            {smallLength(estimate.wire.bareDiameterMm, units)}
          </dd>
        </div>
        <div className="rounded-md border border-rule bg-white p-3">
          <dt className="text-graphite-500">
            {estimate.wire.kind === "litz"
              ? "Bundle diameter"
              : "Overall diameter (max)"}
          </dt>
          <dd className="font-semibold">
            {smallLength(estimate.wire.overallDiameterMm, units)}
            {estimate.wire.overallDiameterIsEstimate ? (
              <span className="ml-1 font-normal text-caution">estimate</span>
            ) : null}
          </dd>
        </div>
        <div className="rounded-md border border-rule bg-white p-3">
          <dt className="text-graphite-500">Mean length of turn</dt>
          <dd className="font-semibold">
            {units === "metric"
              ? formatQuantity(estimate.meanTurnLengthMm, "mm", 1)
              : formatQuantity(mmToInches(estimate.meanTurnLengthMm), "in", 3)}
          </dd>
        </div>
        <div className="rounded-md border border-rule bg-white p-3">
          <dt className="text-graphite-500">Share of each turn in the field</dt>
          <dd className="font-semibold">
            {formatQuantity(estimate.activeShare * 100, "%", 1)}
          </dd>
        </div>
      </dl>
      <TableScroll
        label="Coil estimate per coil and for all coils"
        className="panel p-0"
      >
        <table className="data-table">
          <caption className="sr-only">
            Coil estimate per coil and for all coils
          </caption>
          <thead>
            <tr>
              <th scope="col">Quantity</th>
              <th scope="col" className="text-right">
                Per coil
              </th>
              <th scope="col" className="text-right">
                All {coilCount} {coilCount === 1 ? "coil" : "coils"}
              </th>
            </tr>
          </thead>
          <tbody>
            {quantityRows.map((row) => (
              <tr key={row.label}>
                <th scope="row" className="font-normal">
                  {row.label.replace(
                    "operating temperature",
                    `${temperatureC} °C`,
                  )}
                </th>
                <td className="text-right">
                  {row.render(estimate.perCoil, units)}
                </td>
                <td className="text-right">
                  {row.render(estimate.total, units)}
                </td>
              </tr>
            ))}
            <tr>
              <th scope="row" className="font-normal">
                Copper loss I²R at {temperatureC} °C
              </th>
              <td className="text-right">
                {estimate.copperLossW === null
                  ? "—"
                  : formatQuantity(estimate.copperLossW / coilCount, "W", 2)}
              </td>
              <td className="text-right">
                {estimate.copperLossW === null
                  ? "give a current"
                  : formatQuantity(estimate.copperLossW, "W", 2)}
              </td>
            </tr>
          </tbody>
        </table>
      </TableScroll>
      <p className="text-xs text-graphite-500">
        Totals assume the coils in series. Masses are bare conductor; enamel
        adds about 2 % at 1.0 mm and 5 % at 0.2 mm. First-order estimates:
        insulation systems and electrical safety follow local codes and licensed
        practice.
      </p>
    </section>
  );
}
