import type { CoilEstimate } from "~/engineering/coil-estimate";
import {
  coolingPracticeFor,
  currentDensityPractice,
  type CoolingPractice,
} from "~/engineering/current-density";
import { formatQuantity } from "~/lib/format";
import { TableScroll } from "~/components/table-scroll";

const ohms = (value: number) => formatQuantity(value, "Ω", value < 1 ? 5 : 3);
const watts = (value: number) => formatQuantity(value, "W", 2);
const hertz = (value: number) =>
  value >= 1000
    ? formatQuantity(
        value / 1000,
        "kHz",
        Number.isInteger(value / 1000) ? 0 : 3,
      )
    : formatQuantity(value, "Hz", Number.isInteger(value) ? 0 : 2);

const coolingWords: Record<CoolingPractice, string> = {
  natural: "within natural cooling",
  fan: "needs a fan",
  "liquid-or-short-duty": "needs liquid cooling or short duty",
};

function Figure({
  label,
  value,
  note,
}: {
  label: string;
  value: string;
  note?: string | null;
}) {
  return (
    <div className="rounded-md border border-rule bg-white p-3">
      <dt className="text-graphite-500">{label}</dt>
      <dd className="font-semibold tabular-nums">{value}</dd>
      {note ? <dd className="text-xs text-graphite-500">{note}</dd> : null}
    </div>
  );
}

/** The wire's own figures for litz and flat wire. */
function WireDetail({ wire }: { wire: CoilEstimate["wire"] }) {
  if (wire.litz) {
    const litz = wire.litz;
    return (
      <p className="text-sm">
        Litz: {litz.strands} strands of{" "}
        {formatQuantity(litz.strandBareDiameterMm, "", 3)} mm (
        {formatQuantity(litz.copperAreaMm2, "mm²", 4)} of copper, as one{" "}
        {formatQuantity(litz.equalAreaDiameterMm, "", 3)} mm wire); bundle about{" "}
        {formatQuantity(litz.bundleDiameterMm, "", 2)} mm across (estimate,
        packing {litz.packingFactor}); strands{" "}
        {formatQuantity((litz.takeUpFactor - 1) * 100, "", 0)} % longer than the
        bundle.
        {litz.strandInsulationAssumed
          ? ` Strand film taken as ${litz.strandInsulation === "grade1" ? "grade 1" : "single build"}.`
          : ""}
      </p>
    );
  }
  if (wire.rectangular) {
    const flat = wire.rectangular;
    return (
      <p className="text-sm">
        Flat wire {formatQuantity(flat.thicknessMm, "", 2)} ×{" "}
        {formatQuantity(flat.widthMm, "", 2)} mm, corner radius{" "}
        {formatQuantity(flat.cornerRadiusMm, "", 2)} mm
        {flat.cornerRadiusFromStandard ? " (IEC 60317-0-2)" : ""}:{" "}
        {formatQuantity(flat.areaMm2, "mm²", 4)} of copper
        {flat.overallThicknessMm !== null && flat.overallWidthMm !== null
          ? `; at most ${formatQuantity(flat.overallThicknessMm, "", 2)} × ${formatQuantity(flat.overallWidthMm, "", 2)} mm over the enamel`
          : ""}
        ; wound {flat.edgewise ? "on edge" : "flat"}.
      </p>
    );
  }
  return null;
}

/**
 * Current density, AC resistance at the frequency given, loss with harmonics and the
 * operating temperature, with the cautions that go with them.
 */
export function CoilOperatingResults({
  estimate,
  coilCount,
  temperatureC,
}: {
  estimate: CoilEstimate;
  coilCount: number;
  temperatureC: number;
}) {
  const { perCoil, acLoss, operatingPoint } = estimate;
  const density = perCoil.currentDensityAPerMm2;
  const { naturalCoolingAPerMm2, fanCooledAPerMm2 } = currentDensityPractice;
  return (
    <section aria-labelledby="operation-heading" className="space-y-4">
      <h2 id="operation-heading" className="text-lg font-semibold">
        Current density and AC resistance
      </h2>
      <WireDetail wire={estimate.wire} />
      <dl className="grid grid-cols-2 gap-3 text-sm sm:grid-cols-4">
        <Figure
          label="Current density"
          value={
            density === null
              ? "give a current"
              : formatQuantity(density, "A/mm²", 2)
          }
          note={
            density === null ? null : coolingWords[coolingPracticeFor(density)]
          }
        />
        <Figure
          label="Skin depth"
          value={
            perCoil.skinDepthMm === null
              ? "give a frequency"
              : formatQuantity(perCoil.skinDepthMm, "mm", 3)
          }
          note={
            acLoss || perCoil.skinDepthMm !== null
              ? `at ${temperatureC} °C`
              : null
          }
        />
        <Figure
          label="AC / DC resistance"
          value={
            perCoil.acResistanceRatio === null
              ? "—"
              : formatQuantity(perCoil.acResistanceRatio, "", 3)
          }
          note={
            acLoss
              ? `Dowell, ${acLoss.layersPerCoil} ${acLoss.layersPerCoil === 1 ? "layer" : "layers"}${acLoss.layersAssumed ? " (assumed)" : ""}`
              : null
          }
        />
        <Figure
          label="AC resistance per coil"
          value={
            perCoil.acResistanceOhm === null
              ? "—"
              : ohms(perCoil.acResistanceOhm)
          }
          note={
            perCoil.acResistanceOhm === null ? null : `at ${temperatureC} °C`
          }
        />
      </dl>

      {acLoss ? (
        <TableScroll
          label="Loss at the fundamental and harmonics"
          className="panel p-0"
        >
          <table className="data-table">
            <caption className="sr-only">
              Loss at the fundamental and harmonics
            </caption>
            <thead>
              <tr>
                <th scope="col">Frequency</th>
                <th scope="col" className="text-right">
                  Current (RMS)
                </th>
                <th scope="col" className="text-right">
                  R_ac per coil
                </th>
                <th scope="col" className="text-right">
                  Loss per coil
                </th>
              </tr>
            </thead>
            <tbody>
              {acLoss.harmonics.map((harmonic) => (
                <tr key={harmonic.order}>
                  <th scope="row" className="font-normal">
                    {harmonic.order === 1
                      ? "Fundamental"
                      : `Harmonic ${harmonic.order}`}{" "}
                    ({hertz(harmonic.frequencyHz)})
                  </th>
                  <td className="text-right">
                    {formatQuantity(harmonic.currentA, "A", 2)}
                  </td>
                  <td className="text-right">
                    {ohms(harmonic.acResistanceOhm)}
                  </td>
                  <td className="text-right">{watts(harmonic.lossW)}</td>
                </tr>
              ))}
              <tr>
                <th scope="row" colSpan={3}>
                  AC copper loss per coil at {temperatureC} °C
                </th>
                <td className="text-right font-semibold">
                  {watts(acLoss.lossPerCoilW)}
                </td>
              </tr>
              <tr>
                <th scope="row" colSpan={3}>
                  AC copper loss of all {coilCount}{" "}
                  {coilCount === 1 ? "coil" : "coils"}
                </th>
                <td className="text-right font-semibold">
                  {watts(acLoss.totalLossW)}
                </td>
              </tr>
            </tbody>
          </table>
        </TableScroll>
      ) : null}

      {operatingPoint ? (
        <h3 className="font-semibold">At the operating temperature</h3>
      ) : null}
      {operatingPoint ? (
        <dl className="grid grid-cols-2 gap-3 text-sm sm:grid-cols-4">
          <Figure
            label="Operating temperature"
            value={formatQuantity(operatingPoint.temperatureC, "°C", 1)}
            note={
              operatingPoint.method === "thermal-resistance"
                ? `from ${operatingPoint.ambientC} °C ambient, ${operatingPoint.iterations} steps`
                : `${operatingPoint.ambientC} °C ambient + the rise given`
            }
          />
          <Figure
            label="Resistance there"
            value={ohms(operatingPoint.resistanceOhm)}
            note={
              operatingPoint.acResistanceOhm === null
                ? "DC"
                : `AC ${ohms(operatingPoint.acResistanceOhm)}`
            }
          />
          <Figure
            label="Loss per coil there"
            value={watts(operatingPoint.lossPerCoilW)}
          />
          <Figure
            label={`Loss of all ${coilCount}`}
            value={watts(operatingPoint.totalLossW)}
          />
        </dl>
      ) : null}

      <div className="space-y-1 text-xs text-graphite-500">
        <p>
          Current density, common practice (from memory, no published source):
          up to about {naturalCoolingAPerMm2} A/mm² in an enclosed coil with
          natural cooling, about {fanCooledAPerMm2} A/mm² fan-cooled, more only
          with liquid cooling or short duty.
        </p>
        <p>
          AC resistance by Dowell&apos;s layer method (1966): it takes each
          layer as filling the window&apos;s breadth, so treat it as an estimate
          for tooth coils. Litz figures assume fully transposed strands;
          flat-wire corner radii and enamel are from IEC 60317-0-2 as
          remembered, not checked against the printed standard.
        </p>
        <p className="text-caution">
          A loaded winding gets hot enough to burn: keep its temperature within
          the wire&apos;s thermal class and the insulation system&apos;s rating,
          and guard hot surfaces. Insulation, creepage and electrical safety
          follow local codes and licensed practice.
        </p>
      </div>
    </section>
  );
}
