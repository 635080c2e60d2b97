import type {
  MagnetEstimate,
  MagnetShape,
} from "~/engineering/magnet-estimate";
import { formatQuantity } from "~/lib/format";
import {
  formatMass,
  formatPercentPerKelvin,
  formatRange,
  formatSignificant,
} from "~/reference/quantity-display";

/** What the estimator page knows of a grade (from its loader). */
export interface GradeSummary {
  name: string;
  brMinT: number;
  brMaxT: number;
  maxWorkingTemperatureC: number;
  recoilPermeability: number;
}

/** The request the estimate was made for, as sent to POST /api/v1/magnet-estimates. */
export type EstimatedInput = {
  grade: string;
  shape: MagnetShape;
  count: number;
  temperatureC: number;
  br20T: number | null;
  magnetLengthMm: number | null;
  airGapMm: number | null;
  demagnetisingFieldKAm: number | null;
};

const mm = (value: number) => formatQuantity(value, "mm", decimalsOf(value));

/** Up to three decimals, as typed: 20 → "20", 2.5 → "2.5". */
function decimalsOf(value: number): number {
  const text = String(value);
  const point = text.indexOf(".");
  return point === -1 ? 0 : Math.min(3, text.length - point - 1);
}

export function describeShape(shape: MagnetShape): string {
  switch (shape.kind) {
    case "block":
      return `Block ${formatQuantity(shape.lengthMm, "", decimalsOf(shape.lengthMm))} × ${formatQuantity(shape.widthMm, "", decimalsOf(shape.widthMm))} × ${mm(shape.heightMm)}`;
    case "arc":
      return `Arc segment, radii ${mm(shape.innerRadiusMm)} to ${mm(shape.outerRadiusMm)}, ${formatQuantity(shape.angleDeg, "°", decimalsOf(shape.angleDeg))}, ${mm(shape.axialLengthMm)} long`;
    case "disc":
      return `Disc ⌀ ${mm(shape.diameterMm)} × ${mm(shape.thicknessMm)}`;
    case "ring":
      return `Ring ⌀ ${mm(shape.outerDiameterMm)} outside, ⌀ ${mm(shape.innerDiameterMm)} inside, ${mm(shape.thicknessMm)} thick`;
  }
}

function Row({
  label,
  value,
  note,
}: {
  label: string;
  value: string;
  note?: React.ReactNode;
}) {
  return (
    <div className="grid grid-cols-[minmax(0,1fr)_auto] gap-x-4 border-b border-graphite-100 py-2 last:border-0">
      <dt className="text-sm text-graphite-700">{label}</dt>
      <dd className="text-right font-semibold tabular-nums text-graphite-900">
        {value}
      </dd>
      {note ? (
        <dd className="col-span-2 text-xs text-graphite-500">{note}</dd>
      ) : null}
    </div>
  );
}

export function MagnetEstimateResults({
  estimate,
  input,
  grade,
}: {
  estimate: MagnetEstimate;
  input: EstimatedInput;
  grade: GradeSummary | undefined;
}) {
  const volumeCm3 = estimate.volumeMm3 / 1000;
  return (
    <dl aria-label="Estimate">
      <Row
        label="Volume per piece"
        value={
          estimate.volumeMm3 >= 100
            ? formatQuantity(estimate.volumeMm3, "mm³", 0)
            : formatSignificant(estimate.volumeMm3, "mm³", 4)
        }
        note={formatSignificant(volumeCm3, "cm³", 3)}
      />
      <Row label="Mass per piece" value={formatMass(estimate.massPerPieceKg)} />
      <Row
        label={`Total mass, ${formatQuantity(estimate.count, estimate.count === 1 ? "piece" : "pieces")}`}
        value={formatMass(estimate.totalMassKg)}
      />
      <Row
        label="Br at 20 °C used"
        value={formatQuantity(estimate.br20T, "T", 3)}
        note={
          estimate.br20IsGradeMiddle
            ? grade
              ? `The middle of ${grade.name}'s range, ${formatRange(grade.brMinT, grade.brMaxT, "T", 2)}. Give the maker's value to use it instead.`
              : "The middle of the grade's range."
            : "As given from the data sheet."
        }
      />
      <Row
        label={`Br at the magnet temperature, ${formatQuantity(estimate.temperatureC, "°C")}`}
        value={formatQuantity(estimate.brT, "T", 3)}
        note="Br(T) = Br20 · (1 + αBr · (T − 20 °C)), reversible change only."
      />
      {estimate.hcjKAm === null ? null : (
        <Row
          label={`HcJ at ${formatQuantity(estimate.temperatureC, "°C")}`}
          value={formatQuantity(estimate.hcjKAm, "kA/m", 0)}
          note={`HcJ(T) = HcJ20 · (1 + β · (T − 20 °C)), β ${signedPercentPerK(estimate.hcjTemperatureCoefficientPerK ?? 0)}${
            estimate.hcjCoefficientIsMaterialTypical
              ? " (the material's typical value: the grade gives none)"
              : ""
          }. Estimated from ${formatSignedC(estimate.temperatureRange.minC)} to ${formatSignedC(estimate.temperatureRange.maxC)}; Curie point about ${formatQuantity(estimate.temperatureRange.curieTemperatureC, "°C")}.`}
        />
      )}
      {estimate.airGapFluxDensityT === null ? (
        <Row
          label="Air-gap flux density"
          value="—"
          note="Give the magnet length along magnetisation and the air gap to see it."
        />
      ) : (
        <Row
          label={`Air-gap flux density at ${formatQuantity(estimate.temperatureC, "°C")}`}
          value={formatQuantity(estimate.airGapFluxDensityT, "T", 3)}
          note={
            <>
              B<sub>g</sub> = Br · l<sub>m</sub> / (l<sub>m</sub> + μ
              <sub>rec</sub> · g), surface magnet, leakage neglected; l
              <sub>m</sub> {mm(input.magnetLengthMm ?? 0)}, g{" "}
              {mm(input.airGapMm ?? 0)}
              {grade
                ? `, μrec ${formatQuantity(grade.recoilPermeability, "", 2)}`
                : ""}
              .
            </>
          }
        />
      )}
      <WorkingPointRow estimate={estimate} />
    </dl>
  );
}

function signedPercentPerK(perK: number): string {
  const text = formatPercentPerKelvin(perK, 2);
  return perK > 0 ? `+${text}` : text;
}

function formatSignedC(value: number): string {
  return formatQuantity(value, "°C").replace(/^-/, "−");
}

/** Where the magnet works against its knee: the field in it beside the knee field. */
function WorkingPointRow({ estimate }: { estimate: MagnetEstimate }) {
  const point = estimate.workingPoint;
  if (!point) return null;
  return (
    <Row
      label="Field in the magnet against its knee"
      value={`${formatQuantity(point.demagnetisingFieldKAm, "kA/m", 0)} of ${formatQuantity(point.kneeFieldKAm, "kA/m", 0)}`}
      note={
        <>
          {point.pastKnee
            ? "Past the knee: part of the magnetisation is lost for good."
            : "Below the knee: the change with temperature and load is reversible."}{" "}
          H<sub>m</sub> = (B<sub>m</sub> − Br) / (μ0 · μ<sub>rec</sub>) ={" "}
          {formatQuantity(point.selfFieldKAm, "kA/m", 0).replace(/^-/, "−")}
          {point.appliedFieldKAm > 0
            ? `, plus ${formatQuantity(point.appliedFieldKAm, "kA/m", 0)} from the winding`
            : ""}
          ; knee ≈ {formatQuantity(point.kneeFactor, "", 1)} × HcJ.
        </>
      }
    />
  );
}

/** The inputs an estimate was made for, for the printed page (the form itself is not printed). */
export function MagnetEstimateInputs({ input }: { input: EstimatedInput }) {
  const rows: [string, string][] = [
    ["Grade", input.grade],
    ["Shape", describeShape(input.shape)],
    ["Pieces", formatQuantity(input.count, "")],
    [
      "Magnet temperature",
      formatQuantity(input.temperatureC, "°C", decimalsOf(input.temperatureC)),
    ],
    [
      "Br at 20 °C",
      input.br20T
        ? formatQuantity(input.br20T, "T", 3)
        : "middle of the grade's range",
    ],
    [
      "Magnet length along magnetisation",
      input.magnetLengthMm ? mm(input.magnetLengthMm) : "not given",
    ],
    ["Air gap", input.airGapMm !== null ? mm(input.airGapMm) : "not given"],
    [
      "Demagnetising field from the winding",
      input.demagnetisingFieldKAm
        ? formatQuantity(input.demagnetisingFieldKAm, "kA/m", 0)
        : "none given",
    ],
  ];
  return (
    <dl
      aria-label="Inputs"
      className="grid grid-cols-[auto_1fr] gap-x-6 gap-y-1 text-sm"
    >
      {rows.map(([label, value]) => (
        <div key={label} className="contents">
          <dt className="text-graphite-700">{label}</dt>
          <dd className="font-medium tabular-nums">{value}</dd>
        </div>
      ))}
    </dl>
  );
}

/** The estimate's warnings: past the working temperature or the knee (danger), ferrite in the cold (caution). */
export function MagnetEstimateWarnings({
  warnings,
}: {
  warnings: MagnetEstimate["warnings"];
}) {
  if (warnings.length === 0) return null;
  return (
    <ul aria-label="Warnings" className="mt-4 space-y-2">
      {warnings.map((warning) => (
        <li
          key={warning.code}
          className={`rounded-md border px-3 py-2 text-sm ${
            warning.code === "above-max-working-temperature" ||
            warning.code === "past-the-knee"
              ? "border-danger/50 bg-danger/5 text-danger"
              : "border-caution/50 bg-caution/5 text-graphite-800"
          }`}
        >
          {warning.message}
        </li>
      ))}
    </ul>
  );
}
