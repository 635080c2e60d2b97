/**
 * Volume, mass, remanence and coercivity at temperature, air-gap flux density and the
 * magnet's working point against its knee.
 *
 * - Br(T) = Br20 · (1 + αBr · (T − 20)), αBr in 1/K (brief), used only inside the
 *   material's usable range: never at or above the Curie temperature, never above the
 *   top of the linear model (the higher of the material's limit and the grade's maximum
 *   working temperature; MAGNET_MATERIAL_LIMITS, decision 038).
 * - HcJ(T) = HcJ20 · (1 + β · (T − 20)), β in 1/K: negative for NdFeB and SmCo, positive
 *   for hard ferrite (MAGNET_MATERIAL_LIMITS names the published values).
 * - Surface magnet, leakage neglected: B_g = B_m = Br · l_m / (l_m + μ_rec · g)
 *   (Hanselman, Brushless Permanent Magnet Motor Design; brief). On the recoil line
 *   B = Br + μ0 · μ_rec · H the field in the magnet is H_m = (B_m − Br) / (μ0 · μ_rec)
 *   = −Br · g / (μ0 · (l_m + μ_rec · g)), negative (demagnetising).
 * - The knee: losses become irreversible once |H_m| (plus any demagnetising field the
 *   winding adds) passes H_k ≈ k · HcJ(T), k ≈ 0.9 for sintered NdFeB (common practice,
 *   from memory; per material in MAGNET_MATERIAL_LIMITS).
 * Grades, densities, coefficients and temperature limits come from reference-data.
 */

import {
  EngineeringInputError,
  requireFinite,
  requireNonNegative,
  requirePositive,
  requireWholeNumber,
} from "./errors";
import {
  MAGNET_LOWEST_TEMPERATURE_C,
  MAGNET_MATERIAL_LIMITS,
  findMagnetGrade,
  type MagnetGrade,
} from "./reference-data";

/** μ0, T·m/A (4π × 10⁻⁷; the SI value differs in the tenth figure). */
export const MU_0_T_M_PER_A = 4 * Math.PI * 1e-7;

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
  requireNonNegative(volumeMm3, "volumeMm3", "Volume");
  requirePositive(densityGPerCm3, "densityGPerCm3", "Density");
  return ((volumeMm3 / 1000) * densityGPerCm3) / 1000;
}

/**
 * Br(T) = Br20 · (1 + αBr · (T − 20)), T in °C, αBr in 1/K, Br in T. Refuses a
 * temperature at which the line leaves no remanence (it would go negative); the
 * material's usable range is checked by {@link magnetTemperatureRange}.
 */
export function remanenceAtTemperatureT(
  br20T: number,
  brCoefficientPerK: number,
  temperatureC: number,
): number {
  requirePositive(br20T, "br20T", "Br at 20 °C");
  requireFinite(
    brCoefficientPerK,
    "brTemperatureCoefficientPerK",
    "The Br temperature coefficient",
  );
  requireFinite(temperatureC, "temperatureC", "The magnet temperature");
  const factor = 1 + brCoefficientPerK * (temperatureC - 20);
  if (factor <= 0) {
    throw new EngineeringInputError(
      "temperatureC",
      `At ${temperatureC} °C the linear Br model leaves no remanence: the magnet is far past its usable range.`,
    );
  }
  return br20T * factor;
}

/**
 * HcJ(T) = HcJ20 · (1 + β · (T − 20)), kA/m; β in 1/K (negative for NdFeB and SmCo,
 * positive for hard ferrite). Refuses a temperature at which nothing would be left.
 */
export function coercivityAtTemperatureKAm(
  hcj20KAm: number,
  hcjCoefficientPerK: number,
  temperatureC: number,
): number {
  requirePositive(hcj20KAm, "hcjKAm", "HcJ at 20 °C");
  requireFinite(
    hcjCoefficientPerK,
    "hcjTemperatureCoefficientPerK",
    "The HcJ temperature coefficient",
  );
  requireFinite(temperatureC, "temperatureC", "The magnet temperature");
  const factor = 1 + hcjCoefficientPerK * (temperatureC - 20);
  if (factor <= 0) {
    throw new EngineeringInputError(
      "temperatureC",
      `At ${temperatureC} °C the linear HcJ model leaves no coercivity: the magnet is far past its usable range.`,
    );
  }
  return hcj20KAm * factor;
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
  requirePositive(input.brT, "br20T", "Br");
  requirePositive(
    input.magnetLengthMm,
    "magnetLengthMm",
    "Magnet length along magnetisation",
  );
  requireNonNegative(input.airGapMm, "airGapMm", "Air gap");
  requireRecoilPermeability(input.recoilPermeability);
  return (
    (input.brT * input.magnetLengthMm) /
    (input.magnetLengthMm + input.recoilPermeability * input.airGapMm)
  );
}

function requireRecoilPermeability(value: number): void {
  if (!Number.isFinite(value) || value < 1 || value > 2) {
    throw new EngineeringInputError(
      "recoilPermeability",
      "The recoil permeability must be a number from 1 to 2.",
    );
  }
}

/** Middle of the grade's Br range at 20 °C, T. */
export function gradeMidBrT(grade: MagnetGrade): number {
  return (grade.brMinT + grade.brMaxT) / 2;
}

/** The temperatures a grade's models are used at, °C, and what sets the top. */
export interface MagnetTemperatureRange {
  minC: number;
  /** The highest temperature the estimate answers for: the top of the linear model. */
  maxC: number;
  curieTemperatureC: number;
  /** True when the grade gives no Curie temperature of its own and the material's is used. */
  curieIsMaterialTypical: boolean;
  /** What sets maxC, in words. */
  limitedBy: string;
}

/**
 * The usable range of a grade's temperature models: from −70 °C up to the higher of the
 * material's linear-model limit and the grade's maximum working temperature, and below
 * the Curie temperature in any case (decision 038).
 */
export function magnetTemperatureRange(
  grade: MagnetGrade,
): MagnetTemperatureRange {
  const material = MAGNET_MATERIAL_LIMITS[grade.material];
  const curieTemperatureC =
    grade.curieTemperatureC ?? material.curieTemperatureC;
  const byGrade = grade.maxWorkingTemperatureC > material.linearBrModelMaxC;
  // Below the Curie point in any case: the line is never used within 1 K of it.
  const maxC = Math.min(
    byGrade ? grade.maxWorkingTemperatureC : material.linearBrModelMaxC,
    curieTemperatureC - 1,
  );
  return {
    minC: MAGNET_LOWEST_TEMPERATURE_C,
    maxC,
    curieTemperatureC,
    curieIsMaterialTypical: grade.curieTemperatureC === null,
    limitedBy: byGrade
      ? `${grade.name}'s maximum working temperature`
      : `the top of the range where ${material.label}'s Br temperature coefficient is published`,
  };
}

/** Throws {@link EngineeringInputError} (field "temperatureC") outside the grade's usable range, saying why. */
export function requireUsableMagnetTemperature(
  grade: MagnetGrade,
  temperatureC: number,
): void {
  requireFinite(temperatureC, "temperatureC", "The magnet temperature");
  const range = magnetTemperatureRange(grade);
  const material = MAGNET_MATERIAL_LIMITS[grade.material];
  if (temperatureC >= range.curieTemperatureC) {
    throw new EngineeringInputError(
      "temperatureC",
      `${temperatureC} °C is at or above the Curie temperature of ${material.label} (about ${range.curieTemperatureC} °C): ` +
        `there the magnet has lost its magnetisation altogether, and it does not come back on cooling without remagnetising.`,
    );
  }
  if (temperatureC > range.maxC) {
    throw new EngineeringInputError(
      "temperatureC",
      `${temperatureC} °C is above ${range.maxC} °C, ${range.limitedBy}. ` +
        `Past it Br falls faster than the straight line the estimate uses (to zero at the Curie temperature, about ${range.curieTemperatureC} °C), ` +
        `and ${grade.name} would be demagnetised for good: choose a grade rated for ${temperatureC} °C.`,
    );
  }
  if (temperatureC < range.minC) {
    throw new EngineeringInputError(
      "temperatureC",
      `${temperatureC} °C is below ${range.minC} °C, the lowest temperature the estimate has temperature coefficients for.`,
    );
  }
}

/** Where the magnet works on its recoil line, and how that compares with the knee. */
export interface MagnetWorkingPoint {
  /** Flux density in the magnet B_m (= B_g, leakage neglected), T. */
  fluxDensityT: number;
  /** Field in the magnet from its own circuit H_m = (B_m − Br)/(μ0·μrec), kA/m (negative: demagnetising). */
  selfFieldKAm: number;
  /** Demagnetising field added by the winding, as given, kA/m (≥ 0). */
  appliedFieldKAm: number;
  /** |H_m| + applied field, kA/m. */
  demagnetisingFieldKAm: number;
  /** HcJ at the magnet temperature, kA/m. */
  hcjKAm: number;
  /** H_k ≈ kneeFactor · HcJ(T), kA/m. */
  kneeFieldKAm: number;
  kneeFactor: number;
  /** True when the demagnetising field passes the knee: part of the magnetisation is lost for good. */
  pastKnee: boolean;
}

/**
 * The working point of a surface magnet on its recoil line and the knee check:
 * H_m = (B_m − Br) / (μ0 · μrec) with B_m = Br · l_m / (l_m + μrec · g);
 * past the knee when |H_m| + H_applied > kneeFactor · HcJ(T).
 */
export function magnetWorkingPoint(input: {
  brT: number;
  magnetLengthMm: number;
  airGapMm: number;
  recoilPermeability: number;
  hcjKAm: number;
  kneeFactor: number;
  appliedFieldKAm?: number;
}): MagnetWorkingPoint {
  const fluxDensityT = airGapFluxDensityT(input);
  requirePositive(input.hcjKAm, "hcjKAm", "HcJ");
  if (!(input.kneeFactor > 0 && input.kneeFactor <= 1)) {
    throw new EngineeringInputError(
      "kneeFactor",
      "The knee factor must be more than 0 and at most 1.",
    );
  }
  const appliedFieldKAm = input.appliedFieldKAm ?? 0;
  requireNonNegative(
    appliedFieldKAm,
    "demagnetisingFieldKAm",
    "The demagnetising field",
  );
  const selfFieldKAm =
    (fluxDensityT - input.brT) /
    (MU_0_T_M_PER_A * input.recoilPermeability) /
    1000;
  const demagnetisingFieldKAm = Math.abs(selfFieldKAm) + appliedFieldKAm;
  const kneeFieldKAm = input.kneeFactor * input.hcjKAm;
  return {
    fluxDensityT,
    selfFieldKAm,
    appliedFieldKAm,
    demagnetisingFieldKAm,
    hcjKAm: input.hcjKAm,
    kneeFieldKAm,
    kneeFactor: input.kneeFactor,
    pastKnee: demagnetisingFieldKAm > kneeFieldKAm,
  };
}

export type MagnetWarningCode =
  | "above-max-working-temperature"
  | "coercivity-falls-when-cold"
  | "past-the-knee";

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
  /** Demagnetising field the winding adds at its peak current, kA/m, ≥ 0; default 0. */
  demagnetisingFieldKAm?: number | null;
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
  /** The temperatures this grade's estimate answers for. */
  temperatureRange: MagnetTemperatureRange;
  /** HcJ at temperatureC, kA/m; null when the grade gives no HcJ. */
  hcjKAm: number | null;
  /** β used, 1/K; null when the grade gives no HcJ. */
  hcjTemperatureCoefficientPerK: number | null;
  /** True when β is the material's typical value (the grade gives none). */
  hcjCoefficientIsMaterialTypical: boolean;
  /** Air-gap flux density at temperatureC, T; null unless magnet length and gap are given. */
  airGapFluxDensityT: number | null;
  /** The working point and knee check; null unless magnet length, gap and HcJ are known. */
  workingPoint: MagnetWorkingPoint | null;
  warnings: MagnetWarning[];
}

/** The temperature magnet data sheets give Br and HcJ at (common practice). */
const catalogueTemperatureC = 20;

function magnetWarnings(
  grade: MagnetGrade,
  temperatureC: number,
  workingPoint: MagnetWorkingPoint | null,
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
  if (workingPoint?.pastKnee) {
    const kA = (value: number) => `${Math.round(value)} kA/m`;
    warnings.push({
      code: "past-the-knee",
      message:
        `The field in the magnet, ${kA(workingPoint.demagnetisingFieldKAm)}, passes the knee of ${grade.name} at ${temperatureC} °C ` +
        `(about ${kA(workingPoint.kneeFieldKAm)}, ${workingPoint.kneeFactor} × HcJ ${kA(workingPoint.hcjKAm)}): part of its magnetisation is lost for good. ` +
        `Use a longer magnet, a smaller gap or a grade with a higher HcJ.`,
    });
  }
  return warnings;
}

function requireOptionalPositive(
  value: number | null,
  field: string,
  label: string,
): void {
  if (value !== null) requirePositive(value, field, label);
}

/** Volume, mass, Br and HcJ at temperature, air-gap flux density, working point and warnings for `count` magnets. */
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
  requireWholeNumber(count, "count", "The count");
  const temperatureC = input.temperatureC ?? 20;
  requireUsableMagnetTemperature(grade, temperatureC);
  const givenBr = input.br20T ?? null;
  requireOptionalPositive(givenBr, "br20T", "Br at 20 °C");
  const br20T = givenBr ?? gradeMidBrT(grade);
  const brT = remanenceAtTemperatureT(
    br20T,
    grade.brTemperatureCoefficientPerK,
    temperatureC,
  );

  const material = MAGNET_MATERIAL_LIMITS[grade.material];
  const hcjCoefficient =
    grade.hcjTemperatureCoefficientPerK ??
    material.hcjTemperatureCoefficientPerK;
  const hcjKAm =
    grade.hcjMinKAm > 0
      ? coercivityAtTemperatureKAm(
          grade.hcjMinKAm,
          hcjCoefficient,
          temperatureC,
        )
      : null;

  const volumeMm3 = magnetVolumeMm3(input.shape);
  const massPerPieceKg = massKgFromVolume(volumeMm3, grade.densityGPerCm3);

  const magnetLengthMm = input.magnetLengthMm ?? null;
  const airGapMm = input.airGapMm ?? null;
  const appliedFieldKAm = input.demagnetisingFieldKAm ?? 0;
  const airGapFluxDensity =
    magnetLengthMm === null || airGapMm === null
      ? null
      : airGapFluxDensityT({
          brT,
          magnetLengthMm,
          airGapMm,
          recoilPermeability: grade.recoilPermeability,
        });
  const workingPoint =
    magnetLengthMm === null || airGapMm === null || hcjKAm === null
      ? null
      : magnetWorkingPoint({
          brT,
          magnetLengthMm,
          airGapMm,
          recoilPermeability: grade.recoilPermeability,
          hcjKAm,
          kneeFactor: material.kneeFactor,
          appliedFieldKAm,
        });

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
    temperatureRange: magnetTemperatureRange(grade),
    hcjKAm,
    hcjTemperatureCoefficientPerK: hcjKAm === null ? null : hcjCoefficient,
    hcjCoefficientIsMaterialTypical:
      hcjKAm !== null && grade.hcjTemperatureCoefficientPerK === null,
    airGapFluxDensityT: airGapFluxDensity,
    workingPoint,
    warnings: magnetWarnings(grade, temperatureC, workingPoint),
  };
}
