/**
 * Geometry, mass and resistance of one round magnet-wire strand.
 *
 * - AWG bare diameter by the ASTM B258 formula (never the rounded table).
 * - IEC bare diameter is the nominal diameter: any size of IEC 60317-0-1's range
 *   (0.020–5.000 mm, to 0.001 mm), the R20/R40 steps and the sizes between them.
 * - Overall diameter: the published maximum where known; for a size between the R20/R40
 *   steps, interpolated between the neighbouring published rows; else the fitted
 *   estimate; else null. Every value not printed in the standard is flagged an estimate
 *   (see `interpolateIecMaxOverallDiameter` and `estimateMaxOverallDiameterMm`).
 * - R(T) = R20 · (1 + α20 · (T − 20)) (brief; IEC 60028 for copper).
 *
 * Errors are {@link EngineeringInputError}s whose `field` is the API's input path:
 * "wire.size", "wire.diameterMm", "insulation", "conductor".
 */

import {
  EngineeringInputError,
  requirePositive,
  requireWithin,
} from "./errors";
import {
  awgFormulaDiameterMm,
  conductorMaterial,
  estimateMaxOverallDiameterMm,
  findAwgSize,
  findIecDiameter,
  findInsulationKind,
  findPublishedMaxOverallDiameter,
  iecDiameterProblem,
  interpolateIecMaxOverallDiameter,
  type ConductorKey,
  type InsulationKey,
} from "./reference-data";

/**
 * Conductor temperatures the linear model R(T) = R20 · (1 + α20 · (T − 20)) is used for,
 * °C: the API's plausible range. Copper's linear resistance would reach zero only at
 * 20 − 1/0.00393 = −234.5 °C, far below; above 400 °C no enamel survives (the highest
 * thermal class is 220, IEC 60085).
 */
export const CONDUCTOR_TEMPERATURE_RANGE_C = { min: -70, max: 400 } as const;

/** A wire size as the API takes it. */
export type WireSpec =
  { standard: "AWG"; size: string } | { standard: "IEC"; diameterMm: number };

/** Bare diameter (mm) of an AWG size label ("20", "0000", "4/0") by the ASTM B258 formula. */
export function awgBareDiameterMm(size: string): number {
  const awgSize = findAwgSize(typeof size === "number" ? String(size) : size);
  if (!awgSize) {
    throw new EngineeringInputError(
      "wire.size",
      `AWG size "${size}" is not known. Use 0000 (4/0) to 46, e.g. "20" or "4/0".`,
    );
  }
  return awgFormulaDiameterMm(awgSize.gaugeNumber);
}

/**
 * Bare diameter (mm) of an IEC 60317-0-1 nominal size: an R20/R40 step or a size between
 * the steps (0.350 mm), from 0.020 mm to 5.000 mm, to 0.001 mm. Throws otherwise.
 */
export function iecBareDiameterMm(diameterMm: number): number {
  const diameter = findIecDiameter(diameterMm);
  if (!diameter) {
    throw new EngineeringInputError(
      "wire.diameterMm",
      iecDiameterProblem(diameterMm) ??
        `${diameterMm} mm is not an IEC 60317-0-1 nominal diameter.`,
    );
  }
  return diameter.diameterMm;
}

/** Bare conductor diameter of one strand, mm. */
export function bareDiameterMm(wire: WireSpec): number {
  return wire.standard === "AWG"
    ? awgBareDiameterMm(wire.size)
    : iecBareDiameterMm(wire.diameterMm);
}

/** Area of a circle of diameter `diameterMm`, mm². */
export function circleAreaMm2(diameterMm: number): number {
  requirePositive(diameterMm, "diameterMm", "The diameter");
  return (Math.PI / 4) * diameterMm * diameterMm;
}

/** Bare conductor cross-section of one strand, mm². */
export function conductorAreaMm2(wire: WireSpec): number {
  return circleAreaMm2(bareDiameterMm(wire));
}

export interface OverallDiameter {
  /** Maximum overall diameter over the insulation, mm; null when unknown or no insulation given. */
  overallDiameterMm: number | null;
  /** True when the value is an estimate fitted to published rows, not a standard value. */
  overallDiameterIsEstimate: boolean;
  /** Where the value comes from; null when there is none. */
  overallDiameterSource: string | null;
}

const NO_OVERALL_DIAMETER: OverallDiameter = {
  overallDiameterMm: null,
  overallDiameterIsEstimate: false,
  overallDiameterSource: null,
};

/** The size as the published tables spell it: AWG label ("0000" for "4/0"), IEC mm to 0.001. */
function tableSizeLabel(wire: WireSpec): string {
  if (wire.standard === "AWG") {
    return findAwgSize(wire.size)?.label ?? wire.size;
  }
  return iecBareDiameterMm(wire.diameterMm).toFixed(3);
}

/**
 * Maximum overall diameter of one strand with the given insulation: the published value,
 * else an estimate (flagged), else null. No insulation → null.
 * Throws when the insulation belongs to the other standard (IEC grades go with IEC sizes,
 * single/heavy/triple builds with AWG sizes).
 */
export function overallDiameter(
  wire: WireSpec,
  insulation?: InsulationKey | null,
): OverallDiameter {
  const bare = bareDiameterMm(wire);
  if (insulation === undefined || insulation === null)
    return NO_OVERALL_DIAMETER;

  const kind = findInsulationKind(insulation);
  if (!kind) {
    throw new EngineeringInputError(
      "insulation",
      `Unknown insulation "${String(insulation)}". Use grade1, grade2 or grade3 for IEC wire; single, heavy or triple for AWG wire.`,
    );
  }
  if (kind.standard !== wire.standard) {
    throw new EngineeringInputError(
      "insulation",
      wire.standard === "IEC"
        ? `"${insulation}" is an AWG film build; IEC wire uses grade1, grade2 or grade3.`
        : `"${insulation}" is an IEC grade; AWG wire uses single, heavy or triple build.`,
    );
  }

  const published = findPublishedMaxOverallDiameter(
    wire.standard,
    tableSizeLabel(wire),
    insulation,
  );
  if (published) {
    return {
      overallDiameterMm: published.maxOverallDiameterMm,
      overallDiameterIsEstimate: false,
      overallDiameterSource: published.source,
    };
  }

  if (wire.standard === "IEC") {
    const between = interpolateIecMaxOverallDiameter(bare, insulation);
    const diameter = findIecDiameter(bare);
    if (between && diameter && diameter.series === null) {
      const lower = between.lower;
      const upper = between.upper;
      return {
        overallDiameterMm: between.maxOverallDiameterMm,
        overallDiameterIsEstimate: true,
        overallDiameterSource:
          `ESTIMATE: ${bare.toFixed(3)} mm lies between the R20/R40 steps; maximum overall diameter ` +
          `interpolated linearly between the IEC 60317-0-1 ${insulation.replace("grade", "grade ")} rows ${lower.size} mm ` +
          `(${lower.maxOverallDiameterMm.toFixed(3)} mm) and ${upper.size} mm (${upper.maxOverallDiameterMm.toFixed(3)} mm), not a standard value`,
      };
    }
  }

  const estimate = estimateMaxOverallDiameterMm(
    wire.standard,
    bare,
    insulation,
  );
  if (estimate === null) return NO_OVERALL_DIAMETER;
  return {
    overallDiameterMm: estimate,
    overallDiameterIsEstimate: true,
    overallDiameterSource: `ESTIMATE: enamel increment fitted to the published ${
      wire.standard === "IEC" ? "IEC 60317-0-1" : "NEMA MW 1000"
    } rows (power law in bare diameter), not a standard value`,
  };
}

/** Resistance factor 1 + α20 · (T − 20) of the conductor at `temperatureC` (°C). */
export function resistanceTemperatureFactor(
  conductor: ConductorKey,
  temperatureC: number,
): number {
  requireWithin(
    temperatureC,
    "temperatureC",
    "The conductor temperature",
    CONDUCTOR_TEMPERATURE_RANGE_C.min,
    CONDUCTOR_TEMPERATURE_RANGE_C.max,
    "°C",
  );
  return (
    1 +
    conductorMaterial(conductor).temperatureCoefficient20PerK *
      (temperatureC - 20)
  );
}

/** Resistivity at `temperatureC` (°C), Ω·mm²/m: ρ(T) = ρ20 · (1 + α20 · (T − 20)). */
export function resistivityOhmMm2PerM(
  conductor: ConductorKey,
  temperatureC = 20,
): number {
  return (
    conductorMaterial(conductor).resistivity20OhmMm2PerM *
    resistanceTemperatureFactor(conductor, temperatureC)
  );
}

/** Resistance of one metre of conductor of section `areaMm2` at `temperatureC`, Ω/m. */
export function resistancePerMetreOhm(
  conductor: ConductorKey,
  areaMm2: number,
  temperatureC = 20,
): number {
  requirePositive(areaMm2, "areaMm2", "The conductor section");
  return resistivityOhmMm2PerM(conductor, temperatureC) / areaMm2;
}

/**
 * Bare conductor mass per metre, kg/m. Density in g/cm³ times area in mm² gives g/m,
 * so divide by 1000. The enamel is not included (about 2 % of the mass at 1.0 mm
 * grade 2, about 5 % at 0.2 mm, per the brief).
 */
export function linearMassKgPerM(
  conductor: ConductorKey,
  areaMm2: number,
): number {
  requirePositive(areaMm2, "areaMm2", "The conductor section");
  return (conductorMaterial(conductor).densityGPerCm3 * areaMm2) / 1000;
}

/** Metres of bare conductor per kilogram, m/kg (an upper bound for enamelled wire). */
export function metresPerKg(conductor: ConductorKey, areaMm2: number): number {
  return 1 / linearMassKgPerM(conductor, areaMm2);
}

export interface WireProperties extends OverallDiameter {
  bareDiameterMm: number;
  /** Bare cross-section, mm². */
  areaMm2: number;
  /** Bare conductor mass, kg/m. */
  linearMassKgPerM: number;
  /** Bare conductor length per mass, m/kg. */
  metresPerKg: number;
  /** Resistance per metre at 20 °C, Ω/m. */
  resistancePerMetre20Ohm: number;
  /** Resistance per metre at `temperatureC`, Ω/m. */
  resistancePerMetreOhm: number;
  /** Temperature the resistance is given at, °C. */
  temperatureC: number;
}

/** Everything about one strand of a wire at one temperature (default 20 °C). */
export function wireProperties(input: {
  conductor: ConductorKey;
  wire: WireSpec;
  insulation?: InsulationKey | null;
  temperatureC?: number;
}): WireProperties {
  const temperatureC = input.temperatureC ?? 20;
  const bare = bareDiameterMm(input.wire);
  const areaMm2 = circleAreaMm2(bare);
  return {
    bareDiameterMm: bare,
    ...overallDiameter(input.wire, input.insulation),
    areaMm2,
    linearMassKgPerM: linearMassKgPerM(input.conductor, areaMm2),
    metresPerKg: metresPerKg(input.conductor, areaMm2),
    resistancePerMetre20Ohm: resistancePerMetreOhm(
      input.conductor,
      areaMm2,
      20,
    ),
    resistancePerMetreOhm: resistancePerMetreOhm(
      input.conductor,
      areaMm2,
      temperatureC,
    ),
    temperatureC,
  };
}
