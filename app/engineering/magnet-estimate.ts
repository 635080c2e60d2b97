/**
 * Volume, mass, remanence at temperature and air-gap flux density of permanent magnets.
 *
 * - Br(T) = Br20 · (1 + αBr · (T − 20)), αBr in 1/K (brief).
 * - Surface magnet, leakage neglected: B_g = Br · l_m / (l_m + μ_rec · g)
 *   (Hanselman, Brushless Permanent Magnet Motor Design; brief).
 * Grades, densities, coefficients and temperature limits come from reference-data.
 */

import {
  EngineeringInputError,
  requireNonNegative,
  requirePositive,
} from "./errors";
import { findMagnetGrade, type MagnetGrade } from "./reference-data";

export type MagnetShape =
  /** Rectangular block, mm. */
  | { kind: "block"; lengthMm: number; widthMm: number; heightMm: number }
  /** Arc segment: radii in mm, included angle in degrees, axial length in mm. */
  | {
      kind: "arc";
      innerRadiusMm: number;
      outerRadiusMm: number;
      angleDeg: number;
      axialLengthMm: number;
    }
  /** Solid cylinder, mm. */
  | { kind: "disc"; diameterMm: number; thicknessMm: number }
  /** Hollow cylinder, mm. */
  | {
      kind: "ring";
      outerDiameterMm: number;
      innerDiameterMm: number;
      thicknessMm: number;
    };

/** Volume of one magnet, mm³. Throws {@link EngineeringInputError} for impossible dimensions. */
export function magnetVolumeMm3(shape: MagnetShape): number {
  switch (shape.kind) {
    case "block":
      requirePositive(shape.lengthMm, "shape.lengthMm", "Length");
      requirePositive(shape.widthMm, "shape.widthMm", "Width");
      requirePositive(shape.heightMm, "shape.heightMm", "Height");
      return shape.lengthMm * shape.widthMm * shape.heightMm;
    case "arc": {
      requireNonNegative(
        shape.innerRadiusMm,
        "shape.innerRadiusMm",
        "Inner radius",
      );
      requirePositive(
        shape.outerRadiusMm,
        "shape.outerRadiusMm",
        "Outer radius",
      );
      requirePositive(
        shape.axialLengthMm,
        "shape.axialLengthMm",
        "Axial length",
      );
      if (shape.innerRadiusMm >= shape.outerRadiusMm) {
        throw new EngineeringInputError(
          "shape.innerRadiusMm",
          "The inner radius must be smaller than the outer radius.",
        );
      }
      if (!(shape.angleDeg > 0 && shape.angleDeg <= 360)) {
        throw new EngineeringInputError(
          "shape.angleDeg",
          "The arc angle must be more than 0° and at most 360°.",
        );
      }
      const angleRad = (shape.angleDeg * Math.PI) / 180;
      // Annular sector: (θ/2) · (r_o² − r_i²) · axial length.
      return (
        (angleRad / 2) *
        (shape.outerRadiusMm ** 2 - shape.innerRadiusMm ** 2) *
        shape.axialLengthMm
      );
    }
    case "disc":
      requirePositive(shape.diameterMm, "shape.diameterMm", "Diameter");
      requirePositive(shape.thicknessMm, "shape.thicknessMm", "Thickness");
      return (Math.PI / 4) * shape.diameterMm ** 2 * shape.thicknessMm;
    case "ring":
      requirePositive(
        shape.outerDiameterMm,
        "shape.outerDiameterMm",
        "Outer diameter",
      );
      requireNonNegative(
        shape.innerDiameterMm,
        "shape.innerDiameterMm",
        "Inner diameter",
      );
      requirePositive(shape.thicknessMm, "shape.thicknessMm", "Thickness");
      if (shape.innerDiameterMm >= shape.outerDiameterMm) {
        throw new EngineeringInputError(
          "shape.innerDiameterMm",
          "The inner diameter must be smaller than the outer diameter.",
        );
      }
      return (
        (Math.PI / 4) *
        (shape.outerDiameterMm ** 2 - shape.innerDiameterMm ** 2) *
        shape.thicknessMm
      );
  }
}

/** Mass of `volumeMm3` (mm³) of material of density `densityGPerCm3` (g/cm³), kg. 1 cm³ = 1000 mm³. */
export function massKgFromVolume(
  volumeMm3: number,
  densityGPerCm3: number,
): number {
  return ((volumeMm3 / 1000) * densityGPerCm3) / 1000;
}

/** Br(T) = Br20 · (1 + αBr · (T − 20)), T in °C, αBr in 1/K, Br in T. */
export function remanenceAtTemperatureT(
  br20T: number,
  brCoefficientPerK: number,
  temperatureC: number,
): number {
  return br20T * (1 + brCoefficientPerK * (temperatureC - 20));
}

/**
 * Air-gap flux density over a surface magnet, leakage neglected, T:
 * B_g = Br · l_m / (l_m + μ_rec · g). Magnet length along magnetisation and gap in mm.
 */
export function airGapFluxDensityT(input: {
  brT: number;
  magnetLengthMm: number;
  airGapMm: number;
  recoilPermeability: number;
}): number {
  requirePositive(
    input.magnetLengthMm,
    "magnetLengthMm",
    "Magnet length along magnetisation",
  );
  requireNonNegative(input.airGapMm, "airGapMm", "Air gap");
  return (
    (input.brT * input.magnetLengthMm) /
    (input.magnetLengthMm + input.recoilPermeability * input.airGapMm)
  );
}

/** Middle of the grade's Br range at 20 °C, T. */
export function gradeMidBrT(grade: MagnetGrade): number {
  return (grade.brMinT + grade.brMaxT) / 2;
}

export type MagnetWarningCode =
  "above-max-working-temperature" | "coercivity-falls-when-cold";

export interface MagnetWarning {
  code: MagnetWarningCode;
  message: string;
}

export interface MagnetEstimateInput {
  /** Grade name or key ("N42SH", "SmCo5", "Y30" …) from the built-in table, or a grade's full properties. */
  grade: string | MagnetGrade;
  shape: MagnetShape;
  /** Number of pieces, integer ≥ 1; default 1. */
  count?: number;
  /** Magnet temperature, °C; default 20. */
  temperatureC?: number;
  /** Br at 20 °C from the maker's data sheet, T; default the middle of the grade's range. */
  br20T?: number | null;
  /** Magnet length along the magnetisation direction, mm; with airGapMm gives B_g. */
  magnetLengthMm?: number | null;
  /** Mechanical air gap (plus any non-magnetic sleeve), mm; with magnetLengthMm gives B_g. */
  airGapMm?: number | null;
}

export interface MagnetEstimate {
  gradeName: string;
  count: number;
  /** Volume of one piece. */
  volumeMm3: number;
  volumeM3: number;
  massPerPieceKg: number;
  totalMassKg: number;
  /** Br at 20 °C used, T. */
  br20T: number;
  /** True when br20T is the middle of the grade's range rather than a given value. */
  br20IsGradeMiddle: boolean;
  temperatureC: number;
  /** Br at temperatureC, T. */
  brT: number;
  /** Air-gap flux density at temperatureC, T; null unless magnet length and gap are given. */
  airGapFluxDensityT: number | null;
  warnings: MagnetWarning[];
}

/** The temperature magnet data sheets give Br and HcJ at (common practice). */
const catalogueTemperatureC = 20;

function magnetWarnings(
  grade: MagnetGrade,
  temperatureC: number,
): MagnetWarning[] {
  const warnings: MagnetWarning[] = [];
  if (temperatureC > grade.maxWorkingTemperatureC) {
    warnings.push({
      code: "above-max-working-temperature",
      message: `${temperatureC} °C is above the ${grade.maxWorkingTemperatureC} °C maximum working temperature of ${grade.name}: it may lose magnetisation for good. Choose a higher temperature grade.`,
    });
  }
  // Catalogue coercivities are given at 20 °C; a grade whose coercivity falls when cold
  // (ferrite: its HcJ rises with temperature) is weaker than its data sheet only below that.
  if (grade.coercivityFallsWhenCold && temperatureC < catalogueTemperatureC) {
    warnings.push({
      code: "coercivity-falls-when-cold",
      message: `At ${temperatureC} °C the coercivity of ${grade.name} is below its ${catalogueTemperatureC} °C catalogue value (it falls when cold), so its risk of demagnetisation is at the lowest operating temperature, not the highest: check the working point there.`,
    });
  }
  return warnings;
}

/** Volume, mass, Br at temperature, air-gap flux density and warnings for `count` magnets. */
export function estimateMagnet(input: MagnetEstimateInput): MagnetEstimate {
  const grade =
    typeof input.grade === "string"
      ? findMagnetGrade(input.grade)
      : input.grade;
  if (!grade) {
    throw new EngineeringInputError(
      "grade",
      `Unknown magnet grade "${String(input.grade)}".`,
    );
  }
  const count = input.count ?? 1;
  const temperatureC = input.temperatureC ?? 20;
  const givenBr = input.br20T ?? null;
  const br20T = givenBr ?? gradeMidBrT(grade);
  const brT = remanenceAtTemperatureT(
    br20T,
    grade.brTemperatureCoefficientPerK,
    temperatureC,
  );

  const volumeMm3 = magnetVolumeMm3(input.shape);
  const massPerPieceKg = massKgFromVolume(volumeMm3, grade.densityGPerCm3);

  const magnetLengthMm = input.magnetLengthMm ?? null;
  const airGapMm = input.airGapMm ?? null;

  return {
    gradeName: grade.name,
    count,
    volumeMm3,
    volumeM3: volumeMm3 * 1e-9,
    massPerPieceKg,
    totalMassKg: massPerPieceKg * count,
    br20T,
    br20IsGradeMiddle: givenBr === null,
    temperatureC,
    brT,
    airGapFluxDensityT:
      magnetLengthMm === null || airGapMm === null
        ? null
        : airGapFluxDensityT({
            brT,
            magnetLengthMm,
            airGapMm,
            recoilPermeability: grade.recoilPermeability,
          }),
    warnings: magnetWarnings(grade, temperatureC),
  };
}
