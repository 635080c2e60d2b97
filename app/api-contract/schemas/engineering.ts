/**
 * The answers of the engineering operations (estimates and reference tables) in the
 * contract. Each matches what its route returns field by field; the estimate examples are
 * worked out by the same pure modules the routes use, on the demo workshop's designs
 * (seed/demo-designs.ts: the Kestrel 60-30 outrunner's tooth coils and N42SH blocks).
 */
import { z } from "zod";
import { estimateCoil } from "~/engineering/coil-estimate";
import { estimateMagnet } from "~/engineering/magnet-estimate";
import { MAGNET_GRADES } from "~/engineering/reference-data";
import { windingFactors } from "~/engineering/winding-factor";
import { assessWireSlotFill } from "~/engineering/wire-slot-fill";
import { insulationKeys, magnetMaterialKeys } from "~/lib/estimate-requests";
import { slotFillAnswer } from "~/engineering/wire-slot-fill-answer";

const insulation = z.enum(insulationKeys);
const nullableNumber = (description: string) =>
  z.number().nullable().meta({ description });

const coilQuantityFields = {
  conductorLengthM: z.number().meta({
    description:
      "Conductor wound, all strands: strands × (turns × MLT + 2 × lead), m.",
  }),
  purchasedLengthM: z
    .number()
    .meta({ description: "Conductor drawn from stock (scrap added), m." }),
  woundMassKg: z
    .number()
    .meta({ description: "Bare conductor mass wound, kg." }),
  purchasedMassKg: z
    .number()
    .meta({ description: "Bare conductor mass drawn from stock, kg." }),
  resistance20Ohm: z
    .number()
    .meta({ description: "Resistance between the leads at 20 °C, Ω." }),
  resistanceOhm: z.number().meta({
    description: "Resistance between the leads at temperatureC, Ω.",
  }),
  forceLengthM: z.number().meta({
    description:
      "Conductor in the field that makes force: 2 × turns × active length, m.",
  }),
};

const coilQuantitiesSchema = z.object(coilQuantityFields).meta({
  id: "CoilQuantities",
  description:
    "All coils together: each per-coil figure × coilCount (resistance: all coils in series).",
});

const litzWireSchema = z
  .object({
    strands: z.number().int(),
    strandBareDiameterMm: z.number(),
    strandOverallDiameterMm: z.number(),
    strandOverallDiameterIsEstimate: z.boolean(),
    strandInsulation: insulation,
    strandInsulationAssumed: z.boolean(),
    copperAreaMm2: z.number(),
    equalAreaDiameterMm: z.number(),
    bundleDiameterMm: z.number(),
    packingFactor: z.number(),
    takeUpFactor: z.number(),
  })
  .meta({
    id: "LitzWire",
    description: "The strands, copper and bundle of litz wire.",
  });

const rectangularWireSchema = z
  .object({
    thicknessMm: z.number(),
    widthMm: z.number(),
    cornerRadiusMm: z.number(),
    cornerRadiusFromStandard: z.boolean(),
    areaMm2: z.number(),
    overallThicknessMm: nullableNumber(
      "Over the enamel, mm; null without a grade.",
    ),
    overallWidthMm: nullableNumber(
      "Over the enamel, mm; null without a grade.",
    ),
    edgewise: z.boolean(),
  })
  .meta({ id: "RectangularWire", description: "Flat wire by IEC 60317-0-2." });

const harmonicLossSchema = z.object({
  order: z.number().int().meta({ description: "1 is the fundamental." }),
  currentA: z.number(),
  frequencyHz: z.number(),
  acResistanceOhm: z.number(),
  lossW: z.number().meta({ description: "Per coil, W." }),
});

const coilAcLossSchema = z
  .object({
    frequencyHz: z.number(),
    layersPerCoil: z.number().int(),
    layersAssumed: z.boolean().meta({
      description:
        "True when no layer count was given and one layer was assumed.",
    }),
    temperatureC: z.number(),
    harmonics: z.array(harmonicLossSchema),
    lossPerCoilW: z.number(),
    totalLossW: z.number(),
  })
  .meta({
    id: "CoilAcLoss",
    description: "Loss at the fundamental and harmonics (Dowell).",
  });

const coilOperatingPointSchema = z
  .object({
    method: z.enum(["thermal-resistance", "temperature-rise"]),
    ambientC: z.number(),
    temperatureC: z.number(),
    resistanceOhm: z.number(),
    acResistanceOhm: nullableNumber(
      "At the fundamental; null without a frequency.",
    ),
    lossPerCoilW: z.number(),
    totalLossW: z.number(),
    iterations: z.number().int(),
  })
  .meta({
    id: "CoilOperatingPoint",
    description: "Temperature and loss found together from the thermal input.",
  });

/** The Kestrel 60-30 outrunner's tooth coil at its rated 6 A, 120 °C (seed/demo-designs.ts). */
export const kestrelToothCoil = {
  conductor: "copper",
  wire: { standard: "IEC", diameterMm: 0.5 },
  insulation: "grade2",
  turns: 18,
  strandsInHand: 2,
  activeLengthMm: 31,
  endTurnLengthMm: 11,
  leadLengthMm: 80,
  coilCount: 12,
  temperatureC: 120,
  currentA: 6,
} as const;

export const coilEstimateSchema = z
  .object({
    wire: z.object({
      bareDiameterMm: z.number(),
      overallDiameterMm: nullableNumber(
        "Over the enamel (litz: the bundle), mm; null when unknown, and for flat wire.",
      ),
      overallDiameterIsEstimate: z.boolean(),
      areaMm2: z
        .number()
        .meta({ description: "Copper of one conductor in hand, mm²." }),
      kind: z.enum(["round", "litz", "rectangular"]),
      litz: litzWireSchema.nullable(),
      rectangular: rectangularWireSchema.nullable(),
    }),
    meanTurnLengthMm: z
      .number()
      .meta({ description: "2 · active length + 2 · end-turn length, mm." }),
    activeShare: z.number().meta({
      description:
        "Share of each turn in the field: active ÷ (active + end turn), 0–1.",
    }),
    perCoil: z.object({
      ...coilQuantityFields,
      currentDensityAPerMm2: nullableNumber("A/mm²; null without a current."),
      skinDepthMm: nullableNumber(
        "At the fundamental; null without a frequency.",
      ),
      acResistanceOhm: nullableNumber(
        "At the fundamental; null without a frequency.",
      ),
      acResistanceRatio: nullableNumber(
        "R_ac / R_dc; null without a frequency.",
      ),
    }),
    total: coilQuantitiesSchema,
    copperLossW: nullableNumber(
      "coilCount × I² × per-coil resistance, W; null without a current.",
    ),
    acLoss: coilAcLossSchema.nullable(),
    operatingPoint: coilOperatingPointSchema.nullable(),
  })
  .meta({
    id: "CoilEstimate",
    description:
      "A coil's conductor length, mass, resistance and loss, split into active sides and end turns. First-order engineering estimates.",
    example: estimateCoil(kestrelToothCoil),
  });

const magnetWorkingPointSchema = z
  .object({
    fluxDensityT: z.number(),
    selfFieldKAm: z.number(),
    appliedFieldKAm: z.number(),
    demagnetisingFieldKAm: z.number(),
    hcjKAm: z.number(),
    kneeFieldKAm: z.number(),
    kneeFactor: z.number(),
    pastKnee: z.boolean().meta({
      description: "True when part of the magnetisation is lost for good.",
    }),
  })
  .meta({ id: "MagnetWorkingPoint" });

const demoMagnet = {
  grade: MAGNET_GRADES.find((grade) => grade.name === "N42SH")!,
  shape: { kind: "block", lengthMm: 30, widthMm: 12, heightMm: 4 },
  count: 14,
  temperatureC: 100,
  magnetLengthMm: 4,
  airGapMm: 0.8,
} as const;

export const magnetEstimateSchema = z
  .object({
    gradeName: z.string(),
    count: z.number().int(),
    volumeMm3: z.number().meta({ description: "Of one piece." }),
    volumeM3: z.number(),
    massPerPieceKg: z.number(),
    totalMassKg: z.number(),
    br20T: z.number(),
    br20IsGradeMiddle: z.boolean(),
    temperatureC: z.number(),
    brT: z.number().meta({ description: "Br at temperatureC, T." }),
    temperatureRange: z.object({
      minC: z.number(),
      maxC: z.number(),
      curieTemperatureC: z.number(),
      curieIsMaterialTypical: z.boolean(),
      limitedBy: z.string(),
    }),
    hcjKAm: nullableNumber(
      "HcJ at temperatureC; null when the grade gives none.",
    ),
    hcjTemperatureCoefficientPerK: z.number().nullable(),
    hcjCoefficientIsMaterialTypical: z.boolean(),
    airGapFluxDensityT: nullableNumber(
      "Null unless the magnet length and the air gap are given.",
    ),
    workingPoint: magnetWorkingPointSchema.nullable(),
    warnings: z.array(
      z.object({
        code: z.enum([
          "above-max-working-temperature",
          "coercivity-falls-when-cold",
          "past-the-knee",
        ]),
        message: z.string(),
      }),
    ),
  })
  .meta({
    id: "MagnetEstimate",
    description:
      "Volume, mass, Br and HcJ at temperature, air-gap flux density and the knee check. Strong magnets pinch and shatter: handle with spacers.",
    example: estimateMagnet(demoMagnet),
  });

export const windingFactorsSchema = z
  .object({
    fundamental: z.number().meta({ description: "k_w1, 0–1." }),
    harmonics: z.array(
      z.object({ order: z.number().int(), factor: z.number() }),
    ),
    coilPitch: z.number().int(),
    slotsPerPolePerPhase: z.number(),
    coilsPerPhase: z.number(),
    kind: z.enum(["concentrated", "distributed"]),
  })
  .meta({
    id: "WindingFactors",
    description: "Winding factors by the star of slots, fundamental first.",
    example: windingFactors({ slots: 12, poles: 14, layers: 2 }),
  });

export const slotFillSchema = z
  .object({
    copperFill: z.number(),
    grossFill: nullableNumber("Null when the overall diameter is unknown."),
    limit: z
      .number()
      .meta({ description: "π/√12, what `fits` is judged against." }),
    fits: z.boolean(),
    message: z.string(),
    judgedOn: z.enum(["gross", "copper"]),
    limitPassed: nullableNumber("The most serious limit passed, or null."),
    limitCode: z
      .enum([
        "above-random-round-wire-practice",
        "above-square-packing-limit",
        "above-hexagonal-packing-limit",
      ])
      .nullable(),
    note: z.string().nullable(),
    wireAreaMm2: z.number(),
    insulation,
    insulationAssumed: z.boolean(),
    bareDiameterMm: z.number(),
    overallDiameterMm: z.number().nullable(),
    overallDiameterIsEstimate: z.boolean(),
    overallDiameterSource: z.string().nullable(),
  })
  .meta({
    id: "SlotFill",
    description: "Copper and gross fill of a winding in a slot (decision 037).",
    example: slotFillAnswer(
      assessWireSlotFill({
        wire: { standard: "IEC", diameterMm: 0.5 },
        insulation: "grade2",
        strands: 2,
        turns: 18,
        coilSidesPerSlot: 2,
        slotAreaMm2: 38,
      }),
    ),
  });

export const wireSizeSchema = z
  .object({
    standard: z.enum(["AWG", "IEC"]),
    size: z.string(),
    gaugeNumber: z.number().int().nullable().meta({ description: "AWG only." }),
    series: z
      .string()
      .nullable()
      .meta({ description: "r20 or r40, IEC only." }),
    bareDiameterMm: z.number(),
    areaMm2: z.number(),
    source: z.string(),
    publishedOverallDiametersMm: z.record(z.string(), z.number()).meta({
      description:
        "Maximum overall diameter by insulation (grade1, heavy, …), mm.",
    }),
  })
  .meta({ id: "WireSize" });

const demoGrade = MAGNET_GRADES.find((grade) => grade.name === "N42SH")!;

export const magnetGradeSchema = z
  .object({
    key: z.string(),
    name: z.string(),
    aliases: z.array(z.string()),
    material: z.enum(magnetMaterialKeys),
    temperatureSuffix: z.string().nullable(),
    brMinT: z.number(),
    brMaxT: z.number(),
    hcbMinKAm: z.number(),
    hcjMinKAm: z.number(),
    bhMaxMinKJm3: z.number(),
    bhMaxMaxKJm3: z.number(),
    maxWorkingTemperatureC: z.number().int(),
    brTemperatureCoefficientPerK: z.number(),
    densityGPerCm3: z.number(),
    recoilPermeability: z.number(),
    coercivityFallsWhenCold: z.boolean(),
    hcjTemperatureCoefficientPerK: z.number().nullable(),
    curieTemperatureC: z.number().int().nullable(),
    source: z.string(),
    builtIn: z
      .boolean()
      .meta({ description: "False for grades an admin added." }),
  })
  .meta({
    id: "MagnetGrade",
    example: { ...demoGrade, builtIn: true },
  });
