/**
 * Request schema of POST /api/v1/winding-factors: the winding's slots, poles and layers
 * (phases and coil pitch optional). The shape and types are checked here; whether the
 * combination can make a balanced winding is the engineering module's refusal
 * (`~/engineering/winding-factor`), answered as a 400 naming the field.
 */
import { z } from "zod";

const whole = (label: string) =>
  z
    .number({
      error: (issue) =>
        issue.input === undefined
          ? `Give the ${label}.`
          : `The ${label} must be a number.`,
    })
    .int(`The ${label} must be a whole number.`);

export const windingFactorRequestSchema = z.object({
  slots: whole("slot count")
    .min(3, "The slot count must be at least 3.")
    .max(1000, "The slot count must be at most 1,000."),
  poles: whole("pole count")
    .min(2, "The pole count must be at least 2.")
    .max(500, "The pole count must be at most 500."),
  layers: z.union([z.literal(1), z.literal(2)], {
    error: "The winding has 1 layer (single) or 2 layers (double).",
  }),
  phases: whole("phase count")
    .min(3, "The phase count must be at least 3.")
    .max(15, "The phase count must be at most 15.")
    .optional(),
  coilPitch: whole("coil pitch (in slots)")
    .min(1, "The coil pitch must be at least 1 slot.")
    .optional(),
});

export type WindingFactorRequest = z.infer<typeof windingFactorRequestSchema>;
