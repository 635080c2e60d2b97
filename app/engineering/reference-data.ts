/**
 * Reference data the database is seeded from: conductor materials, AWG and IEC
 * wire sizes, insulation builds, thermal classes and permanent-magnet grades.
 *
 * Every row carries a `source` string. Values that were not confirmed against the
 * printed standard say "from memory"; facts of the trade without a published
 * source say "common practice". "(brief)" marks a value taken from the project's
 * engineering brief, which names the standard or book it comes from.
 *
 * Pure data and lookups: no framework, no database, no Node-only APIs.
 */

import { EngineeringInputError, requireFinite } from "./errors";
import { NDFEB_SUFFIXES, type NdfebSuffix } from "./ndfeb-suffixes";
import { THERMAL_CLASS_LETTERS } from "./thermal-class-letters";
import { inchesToMm, mmToInches } from "./units";

// ---------------------------------------------------------------------------
// Conductor materials
// ---------------------------------------------------------------------------

export type ConductorKey = "copper" | "aluminium";

export interface ConductorMaterial {
  key: ConductorKey;
  name: string;
  /** Resistivity at 20 °C, Ω·mm²/m. */
  resistivity20OhmMm2PerM: number;
  /** Temperature coefficient of resistance at 20 °C, 1/K. */
  temperatureCoefficient20PerK: number;
  /** Density, g/cm³ (numerically equal to kg/dm³, and to g per m per mm² of section). */
  densityGPerCm3: number;
  source: string;
}

export const CONDUCTOR_MATERIALS: readonly ConductorMaterial[] = [
  {
    key: "copper",
    name: "Annealed copper",
    resistivity20OhmMm2PerM: 1 / 58,
    temperatureCoefficient20PerK: 0.00393,
    densityGPerCm3: 8.89,
    source:
      "IEC 60028 (international annealed copper standard): ρ20 = 1/58 Ω·mm²/m, α20 = 0.00393 /K, 8.89 g/cm³ (brief)",
  },
  {
    key: "aluminium",
    name: "Aluminium 1350-O (annealed)",
    // Magnet wire is annealed: ASTM B233's 1350-O value, not the hard-drawn line conductor's 0.028264.
    resistivity20OhmMm2PerM: 0.027899,
    temperatureCoefficient20PerK: 0.00403,
    densityGPerCm3: 2.703,
    source:
      "ASTM B233, aluminium 1350-O (annealed, as magnet wire is) at 61.8 % IACS: ρ20 = 0.027899 Ω·mm²/m; " +
      "α20 = 0.00403 /K and 2.703 g/cm³ (brief; IEC 60889 / ASTM B230 give 0.028264 Ω·mm²/m for hard-drawn line conductor)",
  },
];

/** The material for `key`; throws {@link EngineeringInputError} (field "conductor") when unknown. */
export function conductorMaterial(key: string): ConductorMaterial {
  const material = CONDUCTOR_MATERIALS.find((row) => row.key === key);
  if (!material) {
    throw new EngineeringInputError(
      "conductor",
      `Unknown conductor "${key}". Use copper or aluminium.`,
    );
  }
  return material;
}

// ---------------------------------------------------------------------------
// AWG (ASTM B258)
// ---------------------------------------------------------------------------

/** AWG 36 is 0.005 in = 0.127 mm exactly (ASTM B258). */
export const AWG_36_DIAMETER_MM = 0.127;

/**
 * Bare diameter in mm of AWG gauge number `gaugeNumber` by the ASTM B258 formula
 * d = 0.127 mm · 92^((36 − n)/39). Sizes 0, 00, 000, 0000 use n = 0, −1, −2, −3.
 * This is the exact formula value, not the table rounded to 0.0001 in.
 */
export function awgFormulaDiameterMm(gaugeNumber: number): number {
  if (!Number.isInteger(gaugeNumber) || gaugeNumber < -3 || gaugeNumber > 46) {
    throw new EngineeringInputError(
      "wire.size",
      "The AWG gauge number must be a whole number from −3 (0000) to 46.",
    );
  }
  return AWG_36_DIAMETER_MM * Math.pow(92, (36 - gaugeNumber) / 39);
}

export interface AwgSize {
  /** "0000", "000", "00", "0", "1", …, "46". */
  label: string;
  /** The "n/0" spelling of the aught sizes ("4/0" for "0000"), null for the others. */
  alias: string | null;
  /** n in the ASTM B258 formula (0000 → −3, 000 → −2, 00 → −1, 0 → 0). */
  gaugeNumber: number;
  /** Bare diameter by the formula, mm, unrounded. */
  bareDiameterMm: number;
  source: string;
}

const AWG_SOURCE =
  "ASTM B258 formula d = 0.127 mm · 92^((36 − n)/39), unrounded (brief)";

function awgLabel(gaugeNumber: number): string {
  return gaugeNumber > 0 ? String(gaugeNumber) : "0".repeat(1 - gaugeNumber);
}

function awgAlias(gaugeNumber: number): string | null {
  return gaugeNumber <= 0 ? `${1 - gaugeNumber}/0` : null;
}

/** AWG 0000 (4/0) to 46, largest first. */
export const AWG_SIZES: readonly AwgSize[] = Array.from(
  { length: 50 },
  (_, index) => {
    const gaugeNumber = index - 3;
    return {
      label: awgLabel(gaugeNumber),
      alias: awgAlias(gaugeNumber),
      gaugeNumber,
      bareDiameterMm: awgFormulaDiameterMm(gaugeNumber),
      source: AWG_SOURCE,
    };
  },
);

/**
 * The AWG size for a label: "20", "0000" or its alias "4/0" (also "1/0" … "3/0").
 * Surrounding spaces and a leading "AWG" are ignored. Undefined when not in 0000–46.
 */
export function findAwgSize(label: string): AwgSize | undefined {
  if (typeof label !== "string") return undefined;
  const cleaned = label.trim().replace(/^awg\s*/i, "");
  return AWG_SIZES.find(
    (size) => size.label === cleaned || size.alias === cleaned,
  );
}

/**
 * The rounded ASTM B258 table values (0.0001 in) that the brief transcribes.
 * Results elsewhere use the formula; these exist to say how far the printed
 * table is from it.
 */
export const ASTM_B258_ROUNDED_DIAMETERS: readonly {
  label: string;
  diameterIn: number;
  source: string;
}[] = [
  {
    label: "10",
    diameterIn: 0.1019,
    source: "ASTM B258 rounded table (brief)",
  },
  {
    label: "14",
    diameterIn: 0.0641,
    source: "ASTM B258 rounded table (brief)",
  },
  {
    label: "18",
    diameterIn: 0.0403,
    source: "ASTM B258 rounded table (brief)",
  },
  { label: "20", diameterIn: 0.032, source: "ASTM B258 rounded table (brief)" },
  {
    label: "24",
    diameterIn: 0.0201,
    source: "ASTM B258 rounded table (brief)",
  },
  { label: "30", diameterIn: 0.01, source: "ASTM B258 rounded table (brief)" },
  { label: "36", diameterIn: 0.005, source: "ASTM B258 rounded table (brief)" },
];

// ---------------------------------------------------------------------------
// IEC 60317-0-1 nominal diameters (R20 with R40 intermediates)
// ---------------------------------------------------------------------------

export type PreferredNumberSeries = "r20" | "r40";

export interface IecNominalDiameter {
  /** Nominal bare diameter, mm, to 0.001 mm. */
  diameterMm: number;
  /** "r20" for the main series, "r40" for an intermediate size. */
  series: PreferredNumberSeries;
  source: string;
}

/**
 * The R40 preferred numbers (ISO 3) between 1 and 10, in hundredths.
 * R20 is every other one starting at 1.00.
 */
const R40_MANTISSAS_HUNDREDTHS = [
  100, 106, 112, 118, 125, 132, 140, 150, 160, 170, 180, 190, 200, 212, 224,
  236, 250, 265, 280, 300, 315, 335, 355, 375, 400, 425, 450, 475, 500, 530,
  560, 600, 630, 670, 710, 750, 800, 850, 900, 950,
] as const;

const IEC_SMALLEST_DIAMETER_UM = 20;
const IEC_LARGEST_DIAMETER_UM = 5000;

/**
 * Builds the IEC 60317-0-1 nominal diameters from 0.020 mm to 5.000 mm.
 *
 * Each R40 number is scaled to the decades 0.01 mm, 0.1 mm and 1 mm and expressed in
 * whole micrometres, because the standard prints nominal diameters to 0.001 mm. Below
 * 0.100 mm that rounds half up (0.0315 → 0.032, 0.0355 → 0.036, 0.0425 → 0.043);
 * the rounded spelling below 0.100 mm is from memory of the standard's table.
 */
function buildIecNominalDiameters(): IecNominalDiameter[] {
  const rows: IecNominalDiameter[] = [];
  // Micrometres per hundredth of the mantissa in each decade: 0.01 mm, 0.1 mm, 1 mm.
  for (const micrometresPerHundredth of [0.1, 1, 10]) {
    R40_MANTISSAS_HUNDREDTHS.forEach((mantissa, index) => {
      const micrometres = Math.round(mantissa * micrometresPerHundredth);
      if (
        micrometres < IEC_SMALLEST_DIAMETER_UM ||
        micrometres > IEC_LARGEST_DIAMETER_UM
      ) {
        return;
      }
      const series: PreferredNumberSeries = index % 2 === 0 ? "r20" : "r40";
      rows.push({
        diameterMm: micrometres / 1000,
        series,
        source:
          micrometres < 100
            ? `IEC 60317-0-1 nominal diameter, ${series.toUpperCase()} preferred number (ISO 3) rounded to 0.001 mm (rounding from memory)`
            : `IEC 60317-0-1 nominal diameter, ${series.toUpperCase()} preferred number (ISO 3) (brief; R40 values from the ISO 3 series)`,
      });
    });
  }
  return rows;
}

/** IEC 60317-0-1 nominal diameters 0.020 mm to 5.000 mm, smallest first. */
export const IEC_NOMINAL_DIAMETERS: readonly IecNominalDiameter[] =
  buildIecNominalDiameters();

/** Tolerance when matching a typed diameter to a nominal one, mm. */
const IEC_MATCH_TOLERANCE_MM = 1e-6;

/** The nominal diameter equal to `diameterMm` (to 1e-6 mm), or undefined. */
export function findIecNominalDiameter(
  diameterMm: number,
): IecNominalDiameter | undefined {
  if (typeof diameterMm !== "number" || !Number.isFinite(diameterMm))
    return undefined;
  return IEC_NOMINAL_DIAMETERS.find(
    (row) => Math.abs(row.diameterMm - diameterMm) <= IEC_MATCH_TOLERANCE_MM,
  );
}

/** The range of IEC 60317-0-1 nominal diameters, mm (brief: 0.020 mm to 5.000 mm). */
export const IEC_DIAMETER_RANGE_MM = {
  min: IEC_SMALLEST_DIAMETER_UM / 1000,
  max: IEC_LARGEST_DIAMETER_UM / 1000,
} as const;

/**
 * A diameter between the R20/R40 steps (0.350, 0.550, 0.650, 1.300 mm are commonly
 * stocked): inside the standard's range, to the 0.001 mm the standard prints, but not a
 * preferred number. `below` and `above` are the neighbouring nominal diameters.
 */
export interface IecIntermediateDiameter {
  diameterMm: number;
  series: null;
  below: number;
  above: number;
  source: string;
}

export type IecDiameter = IecNominalDiameter | IecIntermediateDiameter;

/** Why {@link findIecDiameter} refuses a diameter, in words for the person who typed it. */
export function iecDiameterProblem(diameterMm: number): string | null {
  if (typeof diameterMm !== "number" || !Number.isFinite(diameterMm)) {
    return "The nominal diameter must be a number of mm.";
  }
  const { min, max } = IEC_DIAMETER_RANGE_MM;
  if (
    diameterMm < min - IEC_MATCH_TOLERANCE_MM ||
    diameterMm > max + IEC_MATCH_TOLERANCE_MM
  ) {
    return `${diameterMm} mm is outside the IEC 60317-0-1 nominal diameters, ${min.toFixed(3)} mm to ${max.toFixed(3)} mm.`;
  }
  const micrometres = diameterMm * 1000;
  if (Math.abs(micrometres - Math.round(micrometres)) > 1e-6) {
    return `Give the nominal diameter to 0.001 mm, as IEC 60317-0-1 prints it (${diameterMm} mm has more decimals).`;
  }
  return null;
}

/**
 * Any nominal diameter from 0.020 mm to 5.000 mm given to 0.001 mm: the R20/R40 row when
 * it is one, else the size between two steps with its neighbours. Undefined when
 * {@link iecDiameterProblem} has a reason.
 */
export function findIecDiameter(diameterMm: number): IecDiameter | undefined {
  if (iecDiameterProblem(diameterMm) !== null) return undefined;
  const nominal = findIecNominalDiameter(diameterMm);
  if (nominal) return nominal;
  const exact = Math.round(diameterMm * 1000) / 1000;
  const above = IEC_NOMINAL_DIAMETERS.find((row) => row.diameterMm > exact);
  const below = [...IEC_NOMINAL_DIAMETERS]
    .reverse()
    .find((row) => row.diameterMm < exact);
  if (!above || !below) return undefined;
  return {
    diameterMm: exact,
    series: null,
    below: below.diameterMm,
    above: above.diameterMm,
    source: `Between the IEC 60317-0-1 nominal diameters ${below.diameterMm.toFixed(3)} mm and ${above.diameterMm.toFixed(3)} mm (not an R20/R40 step; commonly stocked sizes such as 0.350 mm are of this kind)`,
  };
}

// ---------------------------------------------------------------------------
// Insulation: IEC grades and AWG film builds
// ---------------------------------------------------------------------------

export type WireStandard = "AWG" | "IEC";
export type IecInsulationGrade = "grade1" | "grade2" | "grade3";
export type AwgInsulationBuild = "single" | "heavy" | "triple";
export type InsulationKey = IecInsulationGrade | AwgInsulationBuild;

export interface InsulationKind {
  key: InsulationKey;
  standard: WireStandard;
  name: string;
  source: string;
}

export const INSULATION_KINDS: readonly InsulationKind[] = [
  {
    key: "grade1",
    standard: "IEC",
    name: "IEC 60317 grade 1 (thin)",
    source: "IEC 60317-0-1 (brief)",
  },
  {
    key: "grade2",
    standard: "IEC",
    name: "IEC 60317 grade 2",
    source: "IEC 60317-0-1 (brief)",
  },
  {
    key: "grade3",
    standard: "IEC",
    name: "IEC 60317 grade 3 (thick)",
    source: "IEC 60317-0-1 (brief)",
  },
  {
    key: "single",
    standard: "AWG",
    name: "Single build",
    source: "NEMA MW 1000 (brief)",
  },
  {
    key: "heavy",
    standard: "AWG",
    name: "Heavy build",
    source: "NEMA MW 1000 (brief)",
  },
  {
    key: "triple",
    standard: "AWG",
    name: "Triple build",
    source: "NEMA MW 1000 (brief)",
  },
];

/** The insulation kind for `key`, or undefined. */
export function findInsulationKind(key: string): InsulationKind | undefined {
  return INSULATION_KINDS.find((row) => row.key === key);
}

export interface PublishedOverallDiameter {
  standard: WireStandard;
  /** AWG label ("18") or IEC nominal diameter in mm to 0.001 ("0.200"). */
  size: string;
  insulation: InsulationKey;
  /** Maximum overall diameter over the enamel, mm. */
  maxOverallDiameterMm: number;
  /** The same in inches when the standard gives inches (AWG), else null. */
  maxOverallDiameterIn: number | null;
  source: string;
}

const IEC_OVERALL_SOURCE_TWO_TRANSCRIPTIONS =
  "IEC 60317-0-1 maximum overall diameter (brief: agrees across two transcriptions of the standard)";
const IEC_OVERALL_SOURCE_FROM_MEMORY =
  "IEC 60317-0-1 maximum overall diameter (brief: from memory and one transcription)";
const NEMA_OVERALL_SOURCE = "NEMA MW 1000 maximum overall diameter (brief)";

function iecRow(
  size: string,
  insulation: IecInsulationGrade,
  maxOverallDiameterMm: number,
  source: string,
): PublishedOverallDiameter {
  return {
    standard: "IEC",
    size,
    insulation,
    maxOverallDiameterMm,
    maxOverallDiameterIn: null,
    source,
  };
}

function awgRow(
  size: string,
  insulation: AwgInsulationBuild,
  maxOverallDiameterIn: number,
): PublishedOverallDiameter {
  return {
    standard: "AWG",
    size,
    insulation,
    maxOverallDiameterMm: inchesToMm(maxOverallDiameterIn),
    maxOverallDiameterIn,
    source: NEMA_OVERALL_SOURCE,
  };
}

/** Maximum overall diameters the brief gives; every other size is estimated or unknown. */
export const PUBLISHED_MAX_OVERALL_DIAMETERS: readonly PublishedOverallDiameter[] =
  [
    iecRow("0.200", "grade1", 0.226, IEC_OVERALL_SOURCE_TWO_TRANSCRIPTIONS),
    iecRow("0.200", "grade2", 0.239, IEC_OVERALL_SOURCE_TWO_TRANSCRIPTIONS),
    iecRow("0.200", "grade3", 0.252, IEC_OVERALL_SOURCE_TWO_TRANSCRIPTIONS),
    iecRow("0.500", "grade1", 0.544, IEC_OVERALL_SOURCE_TWO_TRANSCRIPTIONS),
    iecRow("0.500", "grade2", 0.566, IEC_OVERALL_SOURCE_TWO_TRANSCRIPTIONS),
    iecRow("0.500", "grade3", 0.587, IEC_OVERALL_SOURCE_TWO_TRANSCRIPTIONS),
    iecRow("1.000", "grade1", 1.062, IEC_OVERALL_SOURCE_FROM_MEMORY),
    iecRow("1.000", "grade2", 1.093, IEC_OVERALL_SOURCE_FROM_MEMORY),
    iecRow("1.000", "grade3", 1.124, IEC_OVERALL_SOURCE_FROM_MEMORY),
    awgRow("18", "single", 0.0424),
    awgRow("18", "heavy", 0.0437),
    awgRow("18", "triple", 0.0452),
    awgRow("24", "single", 0.0217),
    awgRow("24", "heavy", 0.0227),
    awgRow("24", "triple", 0.0238),
  ];

/** The published row for this wire and insulation, or undefined. */
export function findPublishedMaxOverallDiameter(
  standard: WireStandard,
  size: string,
  insulation: InsulationKey,
): PublishedOverallDiameter | undefined {
  return PUBLISHED_MAX_OVERALL_DIAMETERS.find(
    (row) =>
      row.standard === standard &&
      row.size === size &&
      row.insulation === insulation,
  );
}

/**
 * ESTIMATE of the maximum overall diameter of an IEC wire between two published rows of
 * the same grade: linear interpolation of the maximum overall diameter in the nominal
 * diameter, d_o = d_o,lo + (d − d_lo) / (d_hi − d_lo) · (d_o,hi − d_o,lo). Null when `diameterMm`
 * is not strictly between two published rows of that grade (0.200, 0.500 and 1.000 mm in
 * the brief), or is a published row itself.
 */
export function interpolateIecMaxOverallDiameter(
  diameterMm: number,
  insulation: InsulationKey,
): {
  maxOverallDiameterMm: number;
  lower: PublishedOverallDiameter;
  upper: PublishedOverallDiameter;
} | null {
  if (!Number.isFinite(diameterMm)) return null;
  const rows = PUBLISHED_MAX_OVERALL_DIAMETERS.filter(
    (row) => row.standard === "IEC" && row.insulation === insulation,
  ).sort((a, b) => Number(a.size) - Number(b.size));
  for (let index = 0; index + 1 < rows.length; index += 1) {
    const lower = rows[index]!;
    const upper = rows[index + 1]!;
    const dLow = Number(lower.size);
    const dHigh = Number(upper.size);
    if (diameterMm > dLow && diameterMm < dHigh) {
      const share = (diameterMm - dLow) / (dHigh - dLow);
      return {
        maxOverallDiameterMm:
          lower.maxOverallDiameterMm +
          share * (upper.maxOverallDiameterMm - lower.maxOverallDiameterMm),
        lower,
        upper,
      };
    }
  }
  return null;
}

/**
 * ESTIMATE of the maximum overall diameter for sizes the brief does not tabulate.
 *
 * Method: the enamel increment (max overall − nominal bare diameter) is modelled as a
 * power law Δ = a · d^b in the bare diameter d, fitted per grade or build by least
 * squares on ln Δ against ln d over the published rows above (three rows per IEC grade,
 * exponent ≈ 0.54, residuals under 0.002 mm; two rows per AWG build, exponent ≈ 0.39,
 * an exact fit through both). For AWG the fit is done in inches against the formula
 * diameter. The fit is recomputed from {@link PUBLISHED_MAX_OVERALL_DIAMETERS}, so a
 * corrected row changes the estimate with it.
 *
 * Range: an estimate is returned only near the fitted rows, otherwise null (judged
 * unjustifiable: enamel builds of very fine and very thick wire do not follow one
 * power law). IEC: 0.100 mm to 2.000 mm (one octave beyond the 0.200 mm and 1.000 mm
 * rows). AWG: 14 to 28 (four gauges beyond AWG 18 and 24, because only two rows per
 * build were fitted).
 *
 * This is an estimate, never a standard value; callers return it with
 * `overallDiameterIsEstimate: true`.
 */
export function estimateMaxOverallDiameterMm(
  standard: WireStandard,
  bareDiameterMm: number,
  insulation: InsulationKey,
): number | null {
  if (!Number.isFinite(bareDiameterMm) || bareDiameterMm <= 0) return null;
  const fit = INCREMENT_FITS.find(
    (row) => row.standard === standard && row.insulation === insulation,
  );
  if (!fit) return null;
  const range = ESTIMATE_RANGE_MM[standard];
  if (bareDiameterMm < range.min - 1e-9 || bareDiameterMm > range.max + 1e-9)
    return null;
  if (standard === "AWG") {
    const bareIn = mmToInches(bareDiameterMm);
    return inchesToMm(
      bareIn + fit.coefficient * Math.pow(bareIn, fit.exponent),
    );
  }
  return (
    bareDiameterMm + fit.coefficient * Math.pow(bareDiameterMm, fit.exponent)
  );
}

/** Bare diameter range (mm) in which {@link estimateMaxOverallDiameterMm} answers. */
export const ESTIMATE_RANGE_MM: Readonly<
  Record<WireStandard, { min: number; max: number }>
> = {
  IEC: { min: 0.1, max: 2.0 },
  AWG: { min: awgFormulaDiameterMm(28), max: awgFormulaDiameterMm(14) },
};

interface IncrementFit {
  standard: WireStandard;
  insulation: InsulationKey;
  /** a in Δ = a·d^b (mm for IEC, inches for AWG). */
  coefficient: number;
  /** b in Δ = a·d^b. */
  exponent: number;
}

/** Least-squares fit of ln y = ln a + b ln x. */
function fitPowerLaw(points: readonly { x: number; y: number }[]): {
  coefficient: number;
  exponent: number;
} {
  const logs = points.map((point) => ({
    x: Math.log(point.x),
    y: Math.log(point.y),
  }));
  const meanX = logs.reduce((sum, point) => sum + point.x, 0) / logs.length;
  const meanY = logs.reduce((sum, point) => sum + point.y, 0) / logs.length;
  let covariance = 0;
  let variance = 0;
  for (const point of logs) {
    covariance += (point.x - meanX) * (point.y - meanY);
    variance += (point.x - meanX) ** 2;
  }
  const exponent = covariance / variance;
  return { coefficient: Math.exp(meanY - exponent * meanX), exponent };
}

function publishedBareDiameter(row: PublishedOverallDiameter): number {
  if (row.standard === "IEC") return Number(row.size);
  const size = findAwgSize(row.size);
  if (!size) throw new Error(`Published AWG row for unknown size ${row.size}`);
  return mmToInches(size.bareDiameterMm);
}

function publishedOverallDiameter(row: PublishedOverallDiameter): number {
  return row.standard === "IEC"
    ? row.maxOverallDiameterMm
    : (row.maxOverallDiameterIn ?? mmToInches(row.maxOverallDiameterMm));
}

const INCREMENT_FITS: readonly IncrementFit[] = INSULATION_KINDS.map((kind) => {
  const points = PUBLISHED_MAX_OVERALL_DIAMETERS.filter(
    (row) => row.insulation === kind.key,
  ).map((row) => {
    const bare = publishedBareDiameter(row);
    return { x: bare, y: publishedOverallDiameter(row) - bare };
  });
  return {
    standard: kind.standard,
    insulation: kind.key,
    ...fitPowerLaw(points),
  };
});

// ---------------------------------------------------------------------------
// Thermal classes and enamels (IEC 60085)
// ---------------------------------------------------------------------------

export type ThermalClass = 130 | 155 | 180 | 200 | 220;

export type EnamelKey =
  | "polyurethane"
  | "polyester"
  | "polyesterimide"
  | "polyamide-imide-overcoat"
  | "polyimide";

export interface Enamel {
  key: EnamelKey;
  name: string;
  /** Lowest and highest thermal class the enamel is typically made in, °C. */
  thermalClassMin: ThermalClass;
  thermalClassMax: ThermalClass;
  /** Can be soldered through without stripping. */
  solderable: boolean;
  source: string;
}

export const ENAMELS: readonly Enamel[] = [
  {
    key: "polyurethane",
    name: "Polyurethane",
    thermalClassMin: 130,
    thermalClassMax: 155,
    solderable: true,
    source: "Typical enamel for classes 130–155, solderable (brief)",
  },
  {
    key: "polyester",
    name: "Polyester",
    thermalClassMin: 155,
    thermalClassMax: 180,
    solderable: false,
    source:
      "Typical enamel for classes 155–180 (brief); not solderable (common practice)",
  },
  {
    key: "polyesterimide",
    name: "Polyesterimide",
    thermalClassMin: 155,
    thermalClassMax: 180,
    solderable: false,
    source:
      "Typical enamel for classes 155–180 (brief); not solderable (common practice)",
  },
  {
    key: "polyamide-imide-overcoat",
    name: "Polyamide-imide overcoat",
    thermalClassMin: 200,
    thermalClassMax: 200,
    solderable: false,
    source:
      "Typical enamel for class 200 (brief); not solderable (common practice)",
  },
  {
    key: "polyimide",
    name: "Polyimide",
    thermalClassMin: 220,
    thermalClassMax: 220,
    solderable: false,
    source:
      "Typical enamel for class 220 (brief); not solderable (common practice)",
  },
];

export interface ThermalClassRow {
  /** Thermal class, °C. */
  classC: ThermalClass;
  /** The letter designation used alongside the number. */
  letter: "B" | "F" | "H" | "N" | "R";
  /** Enamels typically made in this class. */
  typicalEnamels: readonly EnamelKey[];
  source: string;
}

function enamelsForClass(classC: ThermalClass): EnamelKey[] {
  return ENAMELS.filter(
    (enamel) =>
      enamel.thermalClassMin <= classC && classC <= enamel.thermalClassMax,
  ).map((enamel) => enamel.key);
}

export const THERMAL_CLASSES: readonly ThermalClassRow[] =
  THERMAL_CLASS_LETTERS.map(([classC, letter]) => ({
    classC,
    letter,
    typicalEnamels: enamelsForClass(classC),
    source: "IEC 60085 thermal classes; typical enamels (brief)",
  }));

/** The wire's thermal class must be at least the motor's insulation class (brief). */
export function isWireClassSufficient(
  wireClassC: number,
  motorClassC: number,
): boolean {
  requireFinite(wireClassC, "wire.thermalClassC", "The wire's thermal class");
  requireFinite(
    motorClassC,
    "insulationClassC",
    "The motor's insulation class",
  );
  return wireClassC >= motorClassC;
}

// ---------------------------------------------------------------------------
// Permanent-magnet grades
// ---------------------------------------------------------------------------

export type MagnetMaterial =
  "sintered-ndfeb" | "smco5" | "sm2co17" | "hard-ferrite" | "bonded-ndfeb";

export { NDFEB_SUFFIXES, type NdfebSuffix } from "./ndfeb-suffixes";

export interface MagnetGrade {
  /** Lookup key, lower case: "n42sh", "smco5", "ferrite-c5". */
  key: string;
  /** The name people write: "N42SH", "SmCo5", "C5 (Y30)". */
  name: string;
  /** Other names accepted by {@link findMagnetGrade}. */
  aliases: readonly string[];
  material: MagnetMaterial;
  /** Temperature suffix for sintered NdFeB, null for other materials. */
  temperatureSuffix: NdfebSuffix | null;
  /** Remanence range at 20 °C, T. */
  brMinT: number;
  brMaxT: number;
  /** Normal coercivity HcB, minimum, kA/m (approximate). */
  hcbMinKAm: number;
  /** Intrinsic coercivity HcJ, minimum, kA/m. */
  hcjMinKAm: number;
  /** Maximum energy product range, kJ/m³. */
  bhMaxMinKJm3: number;
  bhMaxMaxKJm3: number;
  /** Maximum working temperature, °C (depends on the magnet's shape and load line). */
  maxWorkingTemperatureC: number;
  /** Reversible temperature coefficient of Br, 1/K (−0.0012 = −0.12 %/K). */
  brTemperatureCoefficientPerK: number;
  /** Density, g/cm³. */
  densityGPerCm3: number;
  /** Recoil (relative) permeability μrec. */
  recoilPermeability: number;
  /** True when coercivity falls at low temperature (ferrite): the demagnetisation risk is when cold. */
  coercivityFallsWhenCold: boolean;
  /**
   * Reversible temperature coefficient of HcJ, 1/K (−0.006 = −0.6 %/K):
   * HcJ(T) = HcJ20 · (1 + β · (T − 20)). Null when not known (an added grade
   * without it): the material's typical value is used then.
   */
  hcjTemperatureCoefficientPerK: number | null;
  /** Curie temperature, °C; null when not known (the material's typical value is used then). */
  curieTemperatureC: number | null;
  source: string;
}

/**
 * What limits the temperature models of a magnet material, and the typical HcJ
 * coefficient and knee for grades that do not give their own.
 *
 * - Curie temperature: above it the material is no magnet at all.
 * - linearBrModelMaxC: the top of the range over which the reversible Br coefficient
 *   is used. The straight line Br(T) = Br20 · (1 + αBr · (T − 20)) is what makers
 *   publish over roughly −50…150 °C; nearer the Curie point Br falls faster than the
 *   line (it reaches zero at the Curie point, not where the line does: N42's line
 *   reaches zero only at 20 + 1/0.0012 = 853 °C, far above its ≈ 310 °C Curie point).
 *   The estimate uses the line up to the higher of this limit and the grade's own
 *   maximum working temperature, and refuses above it (decision 038).
 * - kneeFactor: H_k ≈ kneeFactor · HcJ(T), the field at which the intrinsic curve
 *   bends and losses become irreversible.
 */
export interface MagnetMaterialLimits {
  material: MagnetMaterial;
  /** Name for messages: "sintered NdFeB". */
  label: string;
  curieTemperatureC: number;
  linearBrModelMaxC: number;
  /** Typical reversible HcJ coefficient, 1/K. */
  hcjTemperatureCoefficientPerK: number;
  kneeFactor: number;
  source: string;
}

/** The lowest temperature the magnet models take, °C (the API's lowest). */
export const MAGNET_LOWEST_TEMPERATURE_C = -70;

export const MAGNET_MATERIAL_LIMITS: Readonly<
  Record<MagnetMaterial, MagnetMaterialLimits>
> = {
  "sintered-ndfeb": {
    material: "sintered-ndfeb",
    label: "sintered NdFeB",
    curieTemperatureC: 310,
    linearBrModelMaxC: 150,
    hcjTemperatureCoefficientPerK: -0.006,
    kneeFactor: 0.9,
    source:
      "Curie temperature 310 °C (magnetsales.com NdFeB properties table; makers give 310–380 °C, higher with Dy and Co: the lowest is used); " +
      "Br coefficient −0.08…−0.12 %/K published over −50…150 °C (US patent 4,902,360, background), so the line is used to 150 °C " +
      "or the grade's rating; HcJ coefficient −0.5…−0.6 %/K (makers' published physical data, e.g. china-magnet.net sintered NdFeB table), " +
      "by suffix from −0.60 %/K (none) to −0.45 %/K (AH); knee H_k ≈ 0.9 · HcJ (squareness of sintered grades, common practice, from memory)",
  },
  smco5: {
    material: "smco5",
    label: "SmCo5",
    curieTemperatureC: 750,
    linearBrModelMaxC: 250,
    hcjTemperatureCoefficientPerK: -0.0028,
    kneeFactor: 0.9,
    source:
      "Curie temperature 750 °C and maximum service temperature 250 °C (magnetsales.com SmCo properties table; sdmmagnetic.com SmCo5 table, Tc 750 °C); " +
      "HcJ coefficient −0.28 %/K (sdmmagnetic.com SmCo5 table); line used to the service temperature (common practice); knee 0.9 · HcJ from memory",
  },
  sm2co17: {
    material: "sm2co17",
    label: "Sm2Co17",
    curieTemperatureC: 825,
    linearBrModelMaxC: 350,
    hcjTemperatureCoefficientPerK: -0.002,
    kneeFactor: 0.8,
    source:
      "Curie temperature 825 °C (magnetsales.com SmCo properties table); grades rated to 350 °C (same table; brief 300–350 °C); " +
      "HcJ coefficient −0.20 %/K from memory, inside the −0.15…−0.30 %/K published for Sm-Co (vormagelectronics.com); knee 0.8 · HcJ from memory (2:17 loops are less square)",
  },
  "hard-ferrite": {
    material: "hard-ferrite",
    label: "hard ferrite",
    curieTemperatureC: 450,
    linearBrModelMaxC: 250,
    hcjTemperatureCoefficientPerK: 0.0027,
    kneeFactor: 0.9,
    source:
      "Curie temperature 450 °C (Sr-ferrite, comparison table of magnet materials, vectormagnets.com); usable to about 250 °C (brief; hsmagnets.com: 250 °C, 300 °C in some cases); " +
      "HcJ coefficient +0.27 %/K, positive: coercivity rises with temperature (hsmagnets.com ferrite temperature note); knee 0.9 · HcJ from memory",
  },
  "bonded-ndfeb": {
    material: "bonded-ndfeb",
    label: "bonded NdFeB",
    curieTemperatureC: 310,
    linearBrModelMaxC: 150,
    hcjTemperatureCoefficientPerK: -0.004,
    kneeFactor: 0.7,
    source:
      "Curie temperature 310 °C, the lower end of 310–400 °C (comparison table of magnet materials, vectormagnets.com); " +
      "line to 150 °C (binder-limited, from memory); HcJ coefficient −0.40 %/K and knee 0.7 · HcJ (isotropic, rounded loop) from memory",
  },
};

interface NdfebBaseGrade {
  name: "N35" | "N38" | "N42" | "N45" | "N48" | "N52";
  brMinT: number;
  brMaxT: number;
  /** HcJ minimum without a suffix, kA/m (brief). */
  hcjMinNoSuffixKAm: number;
  bhMaxMinKJm3: number;
  bhMaxMaxKJm3: number;
  /** HcB minimum, kA/m: from memory of makers' tables for the grade without suffix. */
  hcbMinKAm: number;
  /** Highest temperature suffix made in this grade (common practice, see below). */
  highestSuffix: NdfebSuffix;
}

/**
 * Sintered NdFeB base grades. Br, HcJ (no suffix) and (BH)max from the brief (makers'
 * published tables, which differ by 1–3 %). HcB is from memory of makers' tables
 * (10.9, 11.3, 11.6, 11.0, 10.5, 10.5 kOe).
 *
 * Highest suffix per grade (common practice; makers' tables, from memory): a higher
 * Br leaves less room for the heavy rare earths that raise HcJ, so high-Br grades are
 * made only up to the lower temperature suffixes. N35 up to AH, N38 up to EH, N42 up
 * to UH, N45 and N48 up to SH, N52 up to H. Some makers offer more (e.g. N45UH or N52SH
 * by grain-boundary diffusion); those are left out here and can be added by an admin.
 */
const NDFEB_BASE_GRADES: readonly NdfebBaseGrade[] = [
  {
    name: "N35",
    brMinT: 1.17,
    brMaxT: 1.22,
    hcjMinNoSuffixKAm: 955,
    bhMaxMinKJm3: 263,
    bhMaxMaxKJm3: 287,
    hcbMinKAm: 868,
    highestSuffix: "AH",
  },
  {
    name: "N38",
    brMinT: 1.22,
    brMaxT: 1.25,
    hcjMinNoSuffixKAm: 955,
    bhMaxMinKJm3: 287,
    bhMaxMaxKJm3: 310,
    hcbMinKAm: 899,
    highestSuffix: "EH",
  },
  {
    name: "N42",
    brMinT: 1.28,
    brMaxT: 1.32,
    hcjMinNoSuffixKAm: 955,
    bhMaxMinKJm3: 318,
    bhMaxMaxKJm3: 342,
    hcbMinKAm: 923,
    highestSuffix: "UH",
  },
  {
    name: "N45",
    brMinT: 1.32,
    brMaxT: 1.38,
    hcjMinNoSuffixKAm: 955,
    bhMaxMinKJm3: 342,
    bhMaxMaxKJm3: 366,
    hcbMinKAm: 876,
    highestSuffix: "SH",
  },
  {
    name: "N48",
    brMinT: 1.37,
    brMaxT: 1.42,
    hcjMinNoSuffixKAm: 876,
    bhMaxMinKJm3: 366,
    bhMaxMaxKJm3: 390,
    hcbMinKAm: 835,
    highestSuffix: "SH",
  },
  {
    name: "N52",
    brMinT: 1.42,
    brMaxT: 1.48,
    hcjMinNoSuffixKAm: 876,
    bhMaxMinKJm3: 390,
    bhMaxMaxKJm3: 422,
    hcbMinKAm: 835,
    highestSuffix: "H",
  },
];

/**
 * Reversible HcJ coefficient of sintered NdFeB by suffix, 1/K: makers' tables give
 * −0.5…−0.6 %/K (e.g. china-magnet.net), the grades with more HcJ at the small end. The
 * split by suffix is from memory of makers' tables: none −0.60, M −0.58, H −0.55,
 * SH −0.53, UH −0.50, EH −0.47, AH −0.45 %/K. The line is conservative near the top of
 * the high grades' range (AH at 220 °C keeps 10 % of its 20 °C HcJ by it; measured
 * curves keep more), so a knee warning there errs on the safe side.
 */
const NDFEB_HCJ_COEFFICIENT_PER_K: Readonly<Record<NdfebSuffix, number>> = {
  "": -0.006,
  M: -0.0058,
  H: -0.0055,
  SH: -0.0053,
  UH: -0.005,
  EH: -0.0047,
  AH: -0.0045,
};

function ndfebHcjCoefficientPerK(suffix: NdfebSuffix): number {
  return NDFEB_HCJ_COEFFICIENT_PER_K[suffix];
}

/** NdFeB constants common to all sintered grades (brief). */
const NDFEB_BR_COEFFICIENT_PER_K = -0.0012;
const NDFEB_DENSITY_G_PER_CM3 = 7.5;
const NDFEB_RECOIL_PERMEABILITY = 1.05;

function buildNdfebGrades(): MagnetGrade[] {
  const grades: MagnetGrade[] = [];
  for (const base of NDFEB_BASE_GRADES) {
    const highest = NDFEB_SUFFIXES.findIndex(
      (row) => row.suffix === base.highestSuffix,
    );
    for (const suffixRow of NDFEB_SUFFIXES.slice(0, highest + 1)) {
      const name = `${base.name}${suffixRow.suffix}`;
      const noSuffix = suffixRow.suffix === "";
      grades.push({
        key: name.toLowerCase(),
        name,
        aliases: [],
        material: "sintered-ndfeb",
        temperatureSuffix: suffixRow.suffix,
        brMinT: base.brMinT,
        brMaxT: base.brMaxT,
        hcbMinKAm: base.hcbMinKAm,
        hcjMinKAm: noSuffix ? base.hcjMinNoSuffixKAm : suffixRow.hcjMinKAm,
        bhMaxMinKJm3: base.bhMaxMinKJm3,
        bhMaxMaxKJm3: base.bhMaxMaxKJm3,
        maxWorkingTemperatureC: suffixRow.maxWorkingTemperatureC,
        brTemperatureCoefficientPerK: NDFEB_BR_COEFFICIENT_PER_K,
        densityGPerCm3: NDFEB_DENSITY_G_PER_CM3,
        recoilPermeability: NDFEB_RECOIL_PERMEABILITY,
        coercivityFallsWhenCold: false,
        hcjTemperatureCoefficientPerK: ndfebHcjCoefficientPerK(
          suffixRow.suffix,
        ),
        curieTemperatureC:
          MAGNET_MATERIAL_LIMITS["sintered-ndfeb"].curieTemperatureC,
        source:
          `Sintered NdFeB ${name}: Br, (BH)max and HcJ ${noSuffix ? `(${base.name} without suffix)` : `(suffix ${suffixRow.suffix})`}, ` +
          "max working temperature, αBr −0.12 %/K, 7.5 g/cm³, μrec 1.05 from makers' published tables (brief); " +
          `Br and (BH)max of the base grade ${base.name} used for every suffix (common practice); ` +
          "HcB from memory (makers' tables, base grade; suffixed grades list the same or higher); " +
          "grade/suffix combinations offered: common practice; " +
          `HcJ coefficient ${(ndfebHcjCoefficientPerK(suffixRow.suffix) * 100).toFixed(2)} %/K and Curie temperature 310 °C: see MAGNET_MATERIAL_LIMITS`,
      });
    }
  }
  return grades;
}

const OTHER_MAGNET_GRADES: readonly MagnetGrade[] = [
  {
    key: "smco5",
    name: "SmCo5",
    aliases: ["smco 1:5"],
    material: "smco5",
    temperatureSuffix: null,
    brMinT: 0.8,
    brMaxT: 1.0,
    hcbMinKAm: 600,
    hcjMinKAm: 1194,
    bhMaxMinKJm3: 127,
    bhMaxMaxKJm3: 191,
    maxWorkingTemperatureC: 250,
    brTemperatureCoefficientPerK: -0.00045,
    densityGPerCm3: 8.3,
    recoilPermeability: 1.05,
    coercivityFallsWhenCold: false,
    hcjTemperatureCoefficientPerK:
      MAGNET_MATERIAL_LIMITS["smco5"].hcjTemperatureCoefficientPerK,
    curieTemperatureC: MAGNET_MATERIAL_LIMITS["smco5"].curieTemperatureC,
    source:
      "SmCo5: Br 0.80–1.00 T, 250 °C, −0.045 %/K, 8.3 g/cm³ (brief); HcB ≥ 600 kA/m, HcJ ≥ 1194 kA/m (15 kOe), " +
      "(BH)max 127–191 kJ/m³ (16–24 MGOe) and μrec 1.05 from memory",
  },
  {
    key: "sm2co17",
    name: "Sm2Co17",
    aliases: ["smco 2:17"],
    material: "sm2co17",
    temperatureSuffix: null,
    brMinT: 1.0,
    brMaxT: 1.16,
    hcbMinKAm: 680,
    hcjMinKAm: 1433,
    bhMaxMinKJm3: 191,
    bhMaxMaxKJm3: 255,
    maxWorkingTemperatureC: 300,
    brTemperatureCoefficientPerK: -0.0003,
    densityGPerCm3: 8.4,
    recoilPermeability: 1.05,
    coercivityFallsWhenCold: false,
    hcjTemperatureCoefficientPerK:
      MAGNET_MATERIAL_LIMITS["sm2co17"].hcjTemperatureCoefficientPerK,
    curieTemperatureC: MAGNET_MATERIAL_LIMITS["sm2co17"].curieTemperatureC,
    source:
      "Sm2Co17: Br 1.00–1.16 T, 300–350 °C (the lower bound 300 °C used), −0.03 %/K, 8.4 g/cm³ (brief); " +
      "HcB ≥ 680 kA/m, HcJ ≥ 1433 kA/m (18 kOe, standard coercivity), (BH)max 191–255 kJ/m³ (24–32 MGOe) and μrec 1.05 from memory",
  },
  {
    key: "ferrite-c5",
    name: "C5 (Y30)",
    aliases: ["c5", "y30", "ferrite c5", "hard ferrite"],
    material: "hard-ferrite",
    temperatureSuffix: null,
    brMinT: 0.37,
    brMaxT: 0.4,
    hcbMinKAm: 175,
    hcjMinKAm: 180,
    bhMaxMinKJm3: 26,
    bhMaxMaxKJm3: 30,
    maxWorkingTemperatureC: 250,
    brTemperatureCoefficientPerK: -0.002,
    densityGPerCm3: 4.9,
    recoilPermeability: 1.1,
    coercivityFallsWhenCold: true,
    hcjTemperatureCoefficientPerK:
      MAGNET_MATERIAL_LIMITS["hard-ferrite"].hcjTemperatureCoefficientPerK,
    curieTemperatureC: MAGNET_MATERIAL_LIMITS["hard-ferrite"].curieTemperatureC,
    source:
      "Hard ferrite C5 ≈ Y30: Br 0.37–0.40 T, −0.20 %/K, 4.9 g/cm³, about 250 °C; coercivity falls when cold (brief); " +
      "HcB ≥ 175 kA/m, HcJ ≥ 180 kA/m, (BH)max 26–30 kJ/m³ and μrec 1.1 from memory",
  },
  {
    key: "bonded-ndfeb",
    name: "Bonded NdFeB (isotropic)",
    aliases: ["bonded ndfeb", "bonded neodymium"],
    material: "bonded-ndfeb",
    temperatureSuffix: null,
    brMinT: 0.6,
    brMaxT: 0.7,
    hcbMinKAm: 380,
    hcjMinKAm: 640,
    bhMaxMinKJm3: 64,
    bhMaxMaxKJm3: 80,
    maxWorkingTemperatureC: 120,
    brTemperatureCoefficientPerK: -0.0013,
    densityGPerCm3: 6.0,
    recoilPermeability: 1.2,
    coercivityFallsWhenCold: false,
    hcjTemperatureCoefficientPerK:
      MAGNET_MATERIAL_LIMITS["bonded-ndfeb"].hcjTemperatureCoefficientPerK,
    curieTemperatureC: MAGNET_MATERIAL_LIMITS["bonded-ndfeb"].curieTemperatureC,
    source:
      "Isotropic compression-bonded NdFeB: all values from memory (Br 0.60–0.70 T, HcB ≥ 380 kA/m, HcJ ≥ 640 kA/m, " +
      "(BH)max 64–80 kJ/m³, 120 °C limited by the binder, −0.13 %/K, 6.0 g/cm³, μrec 1.2)",
  },
];

/** All magnet grades: sintered NdFeB N35–N52 with the suffixes made, then SmCo5, Sm2Co17, ferrite, bonded NdFeB. */
export const MAGNET_GRADES: readonly MagnetGrade[] = [
  ...buildNdfebGrades(),
  ...OTHER_MAGNET_GRADES,
];

function normaliseGradeName(name: string): string {
  return name.trim().toLowerCase().replace(/\s+/g, " ");
}

/** The grade named `name` ("N42SH", "n42sh", "SmCo5", "Y30" …), or undefined. */
export function findMagnetGrade(name: string): MagnetGrade | undefined {
  if (typeof name !== "string") return undefined;
  const wanted = normaliseGradeName(name);
  return MAGNET_GRADES.find(
    (grade) =>
      grade.key === wanted ||
      normaliseGradeName(grade.name) === wanted ||
      grade.aliases.some((alias) => normaliseGradeName(alias) === wanted),
  );
}
