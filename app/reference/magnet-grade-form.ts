import { formatQuantity } from "~/lib/format";
/**
 * The form admins use to add a magnet grade from a maker's data sheet, shared
 * by the browser (Conform) and the action on /reference. Bounds are
 * plausibility limits for commercial permanent magnets: a value past one is a
 * typing mistake (a unit slip, a decimal in the wrong place), not a magnet.
 */
import { z } from "zod";
import type { MagnetMaterial } from "~/engineering/reference-data";
import { gradeSuffixChoices } from "./magnet-grade-suffixes";
import { magnetMaterialOrder } from "./magnet-materials";

/** μ0, T·m/A (4π × 10⁻⁷; the SI value differs in the tenth figure). */
const MU_0 = 4 * Math.PI * 1e-7;

/**
 * The largest energy product a magnet of remanence Br can have, kJ/m³:
 * Br² / (4 μ0), reached by an ideal straight-line magnet with μrec = 1
 * (textbook magnetostatics). Real grades sit a few per cent below it.
 */
export function idealMaxEnergyProductKJm3(brT: number): number {
  return (brT * brT) / (4 * MU_0) / 1000;
}

export { gradeSuffixChoices };

function number(label: string, unit: string, min: number, max: number) {
  const capital = `${label[0]!.toUpperCase()}${label.slice(1)}`;
  const signed = (value: number) => String(value).replace("-", "−");
  const range = `between ${signed(min)} and ${signed(max)} ${unit}`.trimEnd();
  return z
    .number({
      error: (issue) =>
        issue.input === undefined
          ? `Give ${label}.`
          : `${capital} must be a number.`,
    })
    .min(min, `${capital} must be ${range}.`)
    .max(max, `${capital} must be ${range}.`);
}

export const magnetGradeFormSchema = z
  .object({
    name: z
      .string({ error: 'Give the grade\'s name, e.g. "N45UH".' })
      .trim()
      .min(1, 'Give the grade\'s name, e.g. "N45UH".')
      .max(40, "Use at most 40 characters.")
      .regex(
        /^[A-Za-z0-9][A-Za-z0-9 ()+\-./]*$/,
        "Use letters, digits, spaces and ( ) + - . / only.",
      ),
    material: z.enum(
      magnetMaterialOrder as readonly [MagnetMaterial, ...MagnetMaterial[]],
      {
        error: "Choose the material.",
      },
    ),
    temperatureSuffix: z
      .enum(gradeSuffixChoices, { error: "Choose a suffix from the list." })
      .optional(),
    brMinT: number("the lowest Br", "T", 0.1, 1.6),
    brMaxT: number("the highest Br", "T", 0.1, 1.6),
    hcbMinKAm: number("HcB", "kA/m", 1, 1300),
    hcjMinKAm: number("HcJ", "kA/m", 1, 4000),
    bhMaxMinKJm3: number("the lowest (BH)max", "kJ/m³", 1, 500),
    bhMaxMaxKJm3: number("the highest (BH)max", "kJ/m³", 1, 500),
    maxWorkingTemperatureC: number(
      "the maximum working temperature",
      "°C",
      20,
      400,
    ).int("Give the maximum working temperature in whole degrees."),
    brTemperatureCoefficientPercentPerK: number(
      "the Br temperature coefficient",
      "%/K",
      -0.5,
      0,
    ),
    /** Optional: the material's typical value is used without it (reference-data MAGNET_MATERIAL_LIMITS). */
    hcjTemperatureCoefficientPercentPerK: number(
      "the HcJ temperature coefficient",
      "%/K",
      -1,
      1,
    ).optional(),
    /** Optional: the material's typical value is used without it. */
    curieTemperatureC: number("the Curie temperature", "°C", 100, 1000)
      .int("Give the Curie temperature in whole degrees.")
      .optional(),
    densityGPerCm3: number("the density", "g/cm³", 1, 10),
    recoilPermeability: number("the recoil permeability", "", 1, 2),
    coercivityFallsWhenCold: z.boolean().default(false),
    aliases: z
      .string()
      .trim()
      .max(120, "Use at most 120 characters for other names.")
      .optional()
      .transform((value) =>
        (value ?? "")
          .split(",")
          .map((alias) => alias.trim())
          .filter(Boolean),
      ),
    source: z
      .string({
        error:
          "Say where the values come from, e.g. the maker's data sheet and its date.",
      })
      .trim()
      .min(
        5,
        "Say where the values come from, e.g. the maker's data sheet and its date.",
      )
      .max(500, "Use at most 500 characters."),
  })
  .superRefine((value, context) => {
    if (value.brMaxT < value.brMinT) {
      context.addIssue({
        code: "custom",
        path: ["brMaxT"],
        message: "The highest Br cannot be below the lowest.",
      });
    }
    if (value.bhMaxMaxKJm3 < value.bhMaxMinKJm3) {
      context.addIssue({
        code: "custom",
        path: ["bhMaxMaxKJm3"],
        message: "The highest (BH)max cannot be below the lowest.",
      });
    }
    if (value.hcjMinKAm < value.hcbMinKAm) {
      context.addIssue({
        code: "custom",
        path: ["hcjMinKAm"],
        message: "HcJ is never below HcB: check the two coercivities.",
      });
    }
    const limit = idealMaxEnergyProductKJm3(value.brMaxT);
    if (value.bhMaxMaxKJm3 > limit) {
      context.addIssue({
        code: "custom",
        path: ["bhMaxMaxKJm3"],
        message: `With Br at most ${value.brMaxT} T, (BH)max cannot exceed Br²/(4μ0) = ${formatQuantity(limit, "", 0)} kJ/m³.`,
      });
    }
    if (
      value.curieTemperatureC !== undefined &&
      value.curieTemperatureC <= value.maxWorkingTemperatureC
    ) {
      context.addIssue({
        code: "custom",
        path: ["curieTemperatureC"],
        message: `The Curie temperature must be above the maximum working temperature (${value.maxWorkingTemperatureC} °C): at the Curie point the magnet loses all its magnetisation.`,
      });
    }
    const hcjCoefficient = value.hcjTemperatureCoefficientPercentPerK;
    if (hcjCoefficient !== undefined) {
      // Published signs: HcJ falls as NdFeB and SmCo warm (−0.2…−0.6 %/K) and rises as
      // hard ferrite warms (about +0.27 %/K); see MAGNET_MATERIAL_LIMITS.
      if (value.material === "hard-ferrite" && hcjCoefficient <= 0) {
        context.addIssue({
          code: "custom",
          path: ["hcjTemperatureCoefficientPercentPerK"],
          message:
            "Hard ferrite's HcJ rises as it warms: its coefficient is positive, about +0.2 to +0.4 %/K.",
        });
      }
      if (value.material !== "hard-ferrite" && hcjCoefficient >= 0) {
        context.addIssue({
          code: "custom",
          path: ["hcjTemperatureCoefficientPercentPerK"],
          message:
            "HcJ of NdFeB and SmCo falls as they warm: the coefficient is negative, e.g. −0.6 %/K for NdFeB, −0.3 %/K for SmCo.",
        });
      }
    }
    if (value.temperatureSuffix && value.material !== "sintered-ndfeb") {
      context.addIssue({
        code: "custom",
        path: ["temperatureSuffix"],
        message: "Temperature suffixes belong to sintered NdFeB grades only.",
      });
    }
    if (value.aliases.some((alias) => alias.length > 40)) {
      context.addIssue({
        code: "custom",
        path: ["aliases"],
        message: "Each other name may have at most 40 characters.",
      });
    }
  });

export type MagnetGradeForm = z.infer<typeof magnetGradeFormSchema>;

/** The lookup key of a grade name: lower case, spaces as hyphens ("N45 UH" → "n45-uh"). */
export function magnetGradeKey(name: string): string {
  return name.trim().toLowerCase().replace(/\s+/g, "-");
}
