import { moneyText } from "~/lib/unit-text";
import type { DesignPageData } from "~/designs/design-page.server";
import { formatQuantity } from "~/lib/format";
import { formatMass, formatSignificant } from "~/reference/quantity-display";
import { costBasisText } from "./price-basis-note";

/** A line's figures as last saved, beside its editor: a coil's copper and resistance, and the costs. */
export function SavedLineFigures({
  costing,
  position,
}: {
  costing: DesignPageData["costing"];
  position: number;
}) {
  const coil = costing.coils.find((figures) => figures.line === position);
  const cost = costing.lines[position - 1];
  const rows: [string, string][] = [];
  if (coil) {
    rows.push(
      ["Copper per motor", formatQuantity(coil.copperLengthM, "m", 3)],
      [
        "Drawn from stock",
        `${formatMass(coil.drawnMassKg)}${coil.massBasis === "bare" ? " (bare conductor)" : ""}`,
      ],
      [
        "R per coil at 20 °C",
        formatSignificant(coil.resistance20PerCoilOhm, "Ω", 4),
      ],
      [
        `R per coil hot (${formatQuantity(coil.operatingTemperatureC, "°C", 0)})`,
        formatSignificant(coil.resistancePerCoilOhm, "Ω", 4),
      ],
      ["Active share", formatQuantity(coil.activeShare * 100, "%", 1)],
      [
        "Copper loss at rated current",
        coil.copperLossW === null
          ? "—"
          : formatQuantity(coil.copperLossW, "W", 2),
      ],
      [
        "Current density at rated current",
        coil.currentDensityAPerMm2 === null
          ? "—"
          : formatQuantity(coil.currentDensityAPerMm2, "A/mm²", 2),
      ],
    );
    if (coil.skinDepthMm !== null && coil.acResistanceRatio !== null)
      rows.push(
        [
          "Skin depth at rated speed's frequency",
          formatQuantity(coil.skinDepthMm, "mm", 3),
        ],
        [
          "AC ÷ DC resistance (one layer, at least)",
          formatQuantity(coil.acResistanceRatio, "", 3),
        ],
      );
  }
  if (cost)
    rows.push([
      "Line cost per motor",
      cost.cost === null ? "no price" : moneyText(cost.cost, costing.currency),
    ]);
  rows.push([
    `Cost per motor, at the ${costBasisText(costing.basis)}`,
    moneyText(costing.costPerMotor, costing.currency),
  ]);
  return (
    <div className="rounded-md border border-rule bg-white/70 p-3">
      <p className="mb-1 text-xs font-semibold uppercase tracking-wide text-graphite-500">
        Line {position} as saved
      </p>
      <dl className="text-sm">
        {rows.map(([label, value]) => (
          <div
            key={label}
            className="flex justify-between gap-3 border-b border-graphite-100 py-1 last:border-0"
          >
            <dt className="text-graphite-700">{label}</dt>
            <dd className="text-right tabular-nums">{value}</dd>
          </div>
        ))}
      </dl>
    </div>
  );
}
