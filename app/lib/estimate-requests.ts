/**
 * Request schemas of the estimate API (POST /api/v1/coil-estimates and
 * /api/v1/magnet-estimates), shared by the API routes and the estimator pages.
 * Every bound below is a plausibility limit: values past it are typing
 * mistakes, not coils.
 */
import { formatNumber } from "~/lib/format";
import { z } from "zod";

const maxLengthMm = 100_000; // 100 m

function number(label: string) {
  return z.number({
    error: (issue) =>
      issue.input === undefined
        ? `Give ${label}.`
        : `${label[0]!.toUpperCase()}${label.slice(1)} must be a number.`,
  });
}

function wholeNumber(label: string, min: number, max: number) {
  return number(label)
    .int(`${label[0]!.toUpperCase()}${label.slice(1)} must be a whole number.`)
    .min(
      min,
      `${label[0]!.toUpperCase()}${label.slice(1)} must be at least ${min}.`,
    )
    .max(max, {
      error: () =>
        `${label[0]!.toUpperCase()}${label.slice(1)} must be at most ${formatNumber(max)}.`,
    });
}

function lengthMm(label: string, { allowZero }: { allowZero: boolean }) {
  const base = number(label).max(
    maxLengthMm,
    `${label[0]!.toUpperCase()}${label.slice(1)} must be at most 100 m (100,000 mm).`,
  );
  return allowZero
    ? base.min(
        0,
        `${label[0]!.toUpperCase()}${label.slice(1)} cannot be negative.`,
      )
    : base.gt(
        0,
        `${label[0]!.toUpperCase()}${label.slice(1)} must be more than 0 mm.`,
      );
}

const temperatureC = number("the temperature")
  .min(-70, "The temperature must be at least −70 °C.")
  .max(400, "The temperature must be at most 400 °C.");

const awgWire = z.object({
  standard: z.literal("AWG"),
  size: z
    .union([z.string(), z.number()], {
      error: 'Give the AWG size, e.g. "20" or "4/0".',
    })
    .transform((value) => String(value).trim())
    .pipe(z.string().min(1, 'Give the AWG size, e.g. "20" or "4/0".')),
});

export const iecDiameterField = number("the nominal diameter").gt(
  0,
  "The nominal diameter must be more than 0 mm.",
);

const iecWire = z.object({
  standard: z.literal("IEC"),
  diameterMm: iecDiameterField,
});

export const wireSpecSchema = z.discriminatedUnion(
  "standard",
  [awgWire, iecWire],
  {
    error: (issue) =>
      issue.input === undefined
        ? 'Give the wire: { standard: "AWG", size } or { standard: "IEC", diameterMm }.'
        : 'The wire standard must be "AWG" or "IEC".',
  },
);

/** Round magnet wire: a strand of litz wire. */
const roundWireSpecSchema = z.discriminatedUnion(
  "standard",
  [awgWire, iecWire],
  {
    error:
      'Give the strand: { standard: "AWG", size } or { standard: "IEC", diameterMm }.',
  },
);

export const litzWireSchema = z.object({
  standard: z.literal("litz"),
  strands: wholeNumber("the strands", 2, 100_000),
  strandWire: roundWireSpecSchema,
  bunchingSteps: wholeNumber("the bunching steps", 1, 10).default(1),
  takeUpFactor: number("the take-up factor")
    .min(1, "The take-up factor must be at least 1.")
    .max(1.2, "The take-up factor must be at most 1.2.")
    .nullish(),
  packingFactor: number("the packing factor")
    .min(0.3, "The packing factor must be at least 0.3.")
    .max(
      0.9069,
      "The packing factor must be at most 0.9069 (hexagonal packing).",
    )
    .nullish(),
});

const flatDimension = (label: string) =>
  number(label)
    .gt(
      0,
      `${label[0]!.toUpperCase()}${label.slice(1)} must be more than 0 mm.`,
    )
    .max(
      100,
      `${label[0]!.toUpperCase()}${label.slice(1)} must be at most 100 mm.`,
    );

export const rectangularWireSchema = z.object({
  standard: z.literal("rectangular"),
  thicknessMm: flatDimension("the thickness"),
  widthMm: flatDimension("the width"),
  cornerRadiusMm: number("the corner radius")
    .min(0, "The corner radius cannot be negative.")
    .max(50, "The corner radius must be at most 50 mm.")
    .nullish(),
  edgewise: z
    .boolean({ error: "Edgewise must be true or false." })
    .default(false),
});

/** Any wire a coil estimate takes: round AWG or IEC, litz, or rectangular (flat). */
export const coilWireSpecSchema = z.discriminatedUnion(
  "standard",
  [awgWire, iecWire, litzWireSchema, rectangularWireSchema],
  {
    error: (issue) =>
      issue.input === undefined
        ? 'Give the wire: { standard: "AWG", size }, { standard: "IEC", diameterMm }, { standard: "litz", strands, strandWire } or { standard: "rectangular", thicknessMm, widthMm }.'
        : 'The wire standard must be "AWG", "IEC", "litz" or "rectangular".',
  },
);

export const insulationKeys = [
  "grade1",
  "grade2",
  "grade3",
  "single",
  "heavy",
  "triple",
] as const;

export const conductorSchema = z.enum(["copper", "aluminium"], {
  error: 'The conductor must be "copper" or "aluminium".',
});

export const insulationSchema = z.enum(insulationKeys, {
  error: `The insulation must be one of ${insulationKeys.join(", ")}.`,
});

/** The coil's numeric fields, shared by the API request and the estimator form. */
export const coilNumberFields = {
  turns: wholeNumber("turns", 1, 100_000),
  strandsInHand: wholeNumber("strands in hand", 1, 1_000).default(1),
  activeLengthMm: lengthMm("the active length", { allowZero: false }),
  endTurnLengthMm: lengthMm("the end-turn length", { allowZero: true }),
  leadLengthMm: lengthMm("the lead length", { allowZero: true }).default(0),
  coilCount: wholeNumber("the coil count", 1, 100_000).default(1),
  temperatureC: temperatureC.default(20),
  scrapPercent: number("the scrap")
    .min(0, "Scrap cannot be negative.")
    .max(100, "Scrap must be at most 100 %.")
    .default(0),
  currentA: number("the current")
    .min(0, "The current cannot be negative.")
    .max(100_000, "The current must be at most 100,000 A.")
    .nullish(),
};

/** The coil's operation at a frequency, shared by the API request and the estimator form. */
export const coilFrequencyFields = {
  frequencyHz: number("the frequency")
    .gt(0, "The frequency must be more than 0 Hz.")
    .max(10_000_000, "The frequency must be at most 10 MHz.")
    .nullish(),
  layersPerCoil: wholeNumber("the layers per coil", 1, 1_000).nullish(),
};

const harmonicSchema = z.object({
  order: wholeNumber("the harmonic's order", 2, 1_000),
  currentA: number("the harmonic's current")
    .min(0, "A harmonic's current cannot be negative.")
    .max(100_000, "A harmonic's current must be at most 100,000 A."),
});

const ambientC = number("the ambient temperature")
  .min(-70, "The ambient temperature must be at least −70 °C.")
  .max(300, "The ambient temperature must be at most 300 °C.");

/** The thermal input's fields, shared by the API request and the estimator form. */
export const thermalFields = {
  ambientC,
  thermalResistanceKPerW: number("the thermal resistance")
    .gt(0, "The thermal resistance must be more than 0 K/W.")
    .max(1_000, "The thermal resistance must be at most 1,000 K/W.")
    .nullish(),
  temperatureRiseK: number("the temperature rise")
    .min(0, "The temperature rise cannot be negative.")
    .max(400, "The temperature rise must be at most 400 K.")
    .nullish(),
};

/** Ambient and either a thermal resistance (K/W, coil to ambient) or a temperature rise (K). */
export const thermalSchema = z
  .object(thermalFields)
  .superRefine((value, context) => {
    const hasResistance = value.thermalResistanceKPerW != null;
    const hasRise = value.temperatureRiseK != null;
    if (hasResistance === hasRise) {
      context.addIssue({
        code: "custom",
        path: ["thermalResistanceKPerW"],
        message:
          "Give either the thermal resistance or the temperature rise, not both.",
      });
    }
  })
  .transform((value) =>
    value.thermalResistanceKPerW != null
      ? {
          ambientC: value.ambientC,
          thermalResistanceKPerW: value.thermalResistanceKPerW,
        }
      : {
          ambientC: value.ambientC,
          temperatureRiseK: value.temperatureRiseK ?? 0,
        },
  );

export const coilEstimateRequestSchema = z.object({
  conductor: conductorSchema,
  wire: coilWireSpecSchema,
  insulation: insulationSchema.nullish(),
  ...coilNumberFields,
  ...coilFrequencyFields,
  harmonics: z
    .array(harmonicSchema, {
      error: "The harmonics must be a list of { order, currentA }.",
    })
    .max(50, "Give at most 50 harmonics.")
    .nullish(),
  thermal: thermalSchema.nullish(),
});

export type CoilEstimateRequest = z.infer<typeof coilEstimateRequestSchema>;

const dimension = (label: string) =>
  number(label)
    .gt(
      0,
      `${label[0]!.toUpperCase()}${label.slice(1)} must be more than 0 mm.`,
    )
    .max(
      10_000,
      `${label[0]!.toUpperCase()}${label.slice(1)} must be at most 10 m.`,
    );

export const magnetShapeSchema = z.discriminatedUnion(
  "kind",
  [
    z.object({
      kind: z.literal("block"),
      lengthMm: dimension("the length"),
      widthMm: dimension("the width"),
      heightMm: dimension("the height"),
    }),
    z.object({
      kind: z.literal("arc"),
      innerRadiusMm: dimension("the inner radius"),
      outerRadiusMm: dimension("the outer radius"),
      angleDeg: number("the angle")
        .gt(0, "The angle must be more than 0°.")
        .max(360, "The angle must be at most 360°."),
      axialLengthMm: dimension("the axial length"),
    }),
    z.object({
      kind: z.literal("disc"),
      diameterMm: dimension("the diameter"),
      thicknessMm: dimension("the thickness"),
    }),
    z.object({
      kind: z.literal("ring"),
      outerDiameterMm: dimension("the outer diameter"),
      innerDiameterMm: dimension("the inner diameter"),
      thicknessMm: dimension("the thickness"),
    }),
  ],
  {
    error:
      'Give the shape: kind "block", "arc", "disc" or "ring" with its dimensions in mm.',
  },
);

/** The magnet materials the engineering modules know (MagnetMaterial in app/engineering/reference-data.ts). */
export const magnetMaterialKeys = [
  "sintered-ndfeb",
  "smco5",
  "sm2co17",
  "hard-ferrite",
  "bonded-ndfeb",
] as const;

/** Properties of a magnet material not in the grade table (e.g. from a maker's data sheet). */
export const magnetPropertiesSchema = z.object({
  name: z.string().trim().min(1).max(40).default("Custom"),
  br20T: number("Br at 20 °C")
    .gt(0, "Br must be more than 0 T.")
    .max(2, "Br must be at most 2 T."),
  brTemperatureCoefficientPerK: number("the Br temperature coefficient")
    .min(
      -0.01,
      "The Br temperature coefficient must be between −0.01 and 0 per K.",
    )
    .max(
      0,
      "The Br temperature coefficient must be between −0.01 and 0 per K.",
    ),
  densityGPerCm3: number("the density")
    .gt(0, "The density must be more than 0 g/cm³.")
    .max(20, "The density must be at most 20 g/cm³."),
  recoilPermeability: number("the recoil permeability")
    .min(1, "The recoil permeability must be between 1 and 2.")
    .max(2, "The recoil permeability must be between 1 and 2.")
    .default(1.05),
  maxWorkingTemperatureC: number("the maximum working temperature")
    .min(-70)
    .max(600),
  /** The material sets the Curie temperature, linear range and knee used when not given; default sintered NdFeB. */
  material: z
    .enum(magnetMaterialKeys, {
      error: `The material must be one of ${magnetMaterialKeys.join(", ")}.`,
    })
    .default("sintered-ndfeb"),
  hcjKAm: number("HcJ at 20 °C")
    .gt(0, "HcJ must be more than 0 kA/m.")
    .max(4000, "HcJ must be at most 4,000 kA/m.")
    .nullish(),
  hcjTemperatureCoefficientPerK: number("the HcJ temperature coefficient")
    .min(
      -0.02,
      "The HcJ temperature coefficient must be between −0.02 and +0.01 per K.",
    )
    .max(
      0.01,
      "The HcJ temperature coefficient must be between −0.02 and +0.01 per K.",
    )
    .nullish(),
  curieTemperatureC: number("the Curie temperature")
    .min(100, "The Curie temperature must be between 100 and 1,000 °C.")
    .max(1000, "The Curie temperature must be between 100 and 1,000 °C.")
    .nullish(),
});

export const magnetEstimateRequestSchema = z
  .object({
    grade: z
      .string()
      .trim()
      .min(1, 'Give a grade, e.g. "N42SH".')
      .max(40)
      .optional(),
    properties: magnetPropertiesSchema.optional(),
    shape: magnetShapeSchema,
    count: wholeNumber("the count", 1, 1_000_000).default(1),
    temperatureC: temperatureC.default(20),
    br20T: number("Br at 20 °C")
      .gt(0, "Br must be more than 0 T.")
      .max(2, "Br must be at most 2 T.")
      .nullish(),
    magnetLengthMm: dimension(
      "the magnet length along magnetisation",
    ).nullish(),
    airGapMm: number("the air gap")
      .min(0, "The air gap cannot be negative.")
      .max(1_000, "The air gap must be at most 1,000 mm.")
      .nullish(),
    demagnetisingFieldKAm: number("the demagnetising field")
      .min(0, "The demagnetising field cannot be negative.")
      .max(10_000, "The demagnetising field must be at most 10,000 kA/m.")
      .nullish(),
  })
  .refine((value) => Boolean(value.grade) !== Boolean(value.properties), {
    path: ["grade"],
    message: "Give either a grade or the material's properties, not both.",
  });

export type MagnetEstimateRequest = z.infer<typeof magnetEstimateRequestSchema>;
