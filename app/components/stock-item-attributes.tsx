import type { MagnetShape } from "~/engineering/magnet-estimate";
import type { MagnetMaterial } from "~/engineering/reference-data";
import { THERMAL_CLASS_LETTERS } from "~/engineering/thermal-class-letters";
import { formatQuantity } from "~/lib/format";
import { quantityText } from "~/lib/unit-text";
import { formatMass, formatSignificant } from "~/reference/quantity-display";
import { magnetMaterialLabels } from "~/reference/magnet-materials";
import { magnetDimensionsText } from "~/stock/magnet-dimensions-text";
import type { WireStockFigures } from "~/stock/stocked-item-figures";

export interface WireAttributes {
  kind: "wire";
  conductor: string;
  standard: "AWG" | "IEC";
  sizeLabel: string;
  insulation: string | null;
  thermalClass: number;
  enamel: string;
  figures: WireStockFigures | null;
  /** The keys' names from the reference data, looked up by the loader. */
  names: {
    conductor: string;
    insulation: string | null;
    enamel: string;
    betweenIecSteps: boolean;
  };
}

export interface MagnetAttributes {
  kind: "magnet";
  gradeKey: string;
  grade: {
    name: string;
    material: MagnetMaterial;
    maxWorkingTemperatureC: number;
    densityGPerCm3: number;
  } | null;
  shape: MagnetShape | null;
  coating: string;
  magnetisation: string;
  figures: { massPerPieceKg: number; totalMassKg: number } | null;
}

function Row({ term, children }: { term: string; children: React.ReactNode }) {
  return (
    <div className="grid grid-cols-[11rem_1fr] gap-3 border-b border-graphite-100 py-1.5 last:border-0">
      <dt className="text-graphite-500">{term}</dt>
      <dd>{children}</dd>
    </div>
  );
}

/** The wire's make-up and what its stock comes to in metres (an upper bound: the stock is weighed with its enamel). */
export function WireAttributeList({
  wire,
  onHandKg,
}: {
  wire: WireAttributes;
  onHandKg: number;
}) {
  const { names } = wire;
  const thermalLetter = THERMAL_CLASS_LETTERS.find(
    ([classC]) => classC === wire.thermalClass,
  )?.[1];
  return (
    <dl className="text-sm">
      <Row term="Conductor">{names.conductor}</Row>
      <Row term="Size">
        {wire.standard === "AWG"
          ? `AWG ${wire.sizeLabel}`
          : `IEC 60317, ${wire.sizeLabel}\u00a0mm nominal${
              names.betweenIecSteps ? " (between the R20/R40 steps)" : ""
            }`}
      </Row>
      <Row term="Insulation">{names.insulation ?? "not given"}</Row>
      <Row term="Thermal class">
        {formatQuantity(wire.thermalClass, "°C")}
        {thermalLetter ? ` (class ${thermalLetter})` : ""}
        <p className="text-xs text-graphite-500">
          The wire&rsquo;s thermal class must be at least the motor&rsquo;s
          insulation class.
        </p>
      </Row>
      <Row term="Enamel">{names.enamel}</Row>
      {wire.figures ? (
        <>
          <Row term="Bare diameter">
            {formatQuantity(wire.figures.bareDiameterMm, "mm", 4)}
          </Row>
          <Row term="Linear mass">
            {formatSignificant(wire.figures.linearMassKgPerM * 1000, "g/m")}{" "}
            <span className="text-graphite-500">(bare conductor)</span>
          </Row>
          <Row term="Length on hand">
            up to {formatQuantity(wire.figures.maxLengthM, "m", 0)}{" "}
            <span className="text-graphite-500">
              for {formatQuantity(onHandKg, "kg", 3)}
            </span>
            <p className="text-xs text-graphite-500">
              An upper bound: the stock is weighed with its enamel, about
              2&nbsp;% of the mass at 1.0&nbsp;mm and about 5&nbsp;% at
              0.2&nbsp;mm, so the real length is a few per cent shorter.
            </p>
          </Row>
        </>
      ) : null}
    </dl>
  );
}

/** The magnet's grade, shape, coating and magnetisation, with its mass from the grade's density. */
export function MagnetAttributeList({
  magnet,
  pieces,
}: {
  magnet: MagnetAttributes;
  pieces: number;
}) {
  return (
    <dl className="text-sm">
      <Row term="Grade">
        {magnet.grade ? (
          <>
            {magnet.grade.name}{" "}
            <span className="text-graphite-500">
              ({magnetMaterialLabels[magnet.grade.material]})
            </span>
            <p className="text-xs text-graphite-500">
              Working temperature up to{" "}
              {formatQuantity(magnet.grade.maxWorkingTemperatureC, "°C")}; past
              it the magnet loses magnetisation for good.
            </p>
          </>
        ) : (
          `${magnet.gradeKey} (no longer in the grade table)`
        )}
      </Row>
      <Row term="Shape">
        {magnet.shape ? (
          <>
            <span className="capitalize">{magnet.shape.kind}</span>:{" "}
            {magnetDimensionsText(magnet.shape)}
          </>
        ) : (
          "not readable"
        )}
      </Row>
      <Row term="Coating">{magnet.coating}</Row>
      <Row term="Magnetisation">{magnet.magnetisation}</Row>
      {magnet.figures && magnet.grade ? (
        <>
          <Row term="Mass per piece">
            {formatMass(magnet.figures.massPerPieceKg)}{" "}
            <span className="text-graphite-500">
              at {formatQuantity(magnet.grade.densityGPerCm3, "g/cm³", 2)}
            </span>
          </Row>
          <Row term="Mass on hand">
            {formatMass(magnet.figures.totalMassKg)}{" "}
            <span className="text-graphite-500">
              for {quantityText(pieces, "pcs")}
            </span>
          </Row>
        </>
      ) : null}
    </dl>
  );
}
