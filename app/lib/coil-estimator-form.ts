/**
 * The coil estimator page's form: flat fields for people, turned into the
 * request of POST /api/v1/coil-estimates. The bounds are the API's own.
 */
import { z } from "zod";
import {
  coilNumberFields,
  conductorSchema,
  iecDiameterField,
  insulationSchema,
  type CoilEstimateRequest,
} from "./estimate-requests";

export const coilEstimatorFormSchema = z
  .object({
    conductor: conductorSchema,
    standard: z.enum(["AWG", "IEC"], { error: "Choose AWG or IEC." }),
    awgSize: z.string().optional(),
    iecDiameterMm: iecDiameterField.optional(),
    insulation: insulationSchema.optional(),
    ...coilNumberFields,
  })
  .superRefine((value, context) => {
    if (value.standard === "AWG" && !value.awgSize) {
      context.addIssue({
        code: "custom",
        path: ["awgSize"],
        message: "Choose the AWG size.",
      });
    }
    if (value.standard === "IEC" && value.iecDiameterMm === undefined) {
      context.addIssue({
        code: "custom",
        path: ["iecDiameterMm"],
        message: "Choose the nominal diameter.",
      });
    }
    const awgBuilds = ["single", "heavy", "triple"];
    if (
      value.insulation &&
      awgBuilds.includes(value.insulation) !== (value.standard === "AWG")
    ) {
      context.addIssue({
        code: "custom",
        path: ["insulation"],
        message:
          value.standard === "AWG"
            ? "AWG wire takes a film build."
            : "IEC wire takes a grade.",
      });
    }
  });

export type CoilEstimatorForm = z.infer<typeof coilEstimatorFormSchema>;

export function coilRequestFromForm(
  form: CoilEstimatorForm,
): CoilEstimateRequest {
  const { standard, awgSize, iecDiameterMm, insulation, ...rest } = form;
  return {
    ...rest,
    wire:
      standard === "AWG"
        ? { standard: "AWG", size: awgSize ?? "" }
        : { standard: "IEC", diameterMm: iecDiameterMm ?? 0 },
    insulation: insulation ?? null,
  };
}

/** Where the API's field names land on the form. */
export function formFieldOfApiField(apiField: string): string {
  if (apiField === "wire.size") return "awgSize";
  if (apiField === "wire.diameterMm") return "iecDiameterMm";
  if (apiField.startsWith("wire")) return "standard";
  return apiField;
}

/** The form's starting values: worked check 4 of the engineering brief, a small tooth coil. */
export const coilEstimatorDefaults = {
  conductor: "copper",
  standard: "IEC",
  awgSize: "20",
  iecDiameterMm: "0.800",
  insulation: "grade2",
  turns: "40",
  strandsInHand: "1",
  activeLengthMm: "50",
  endTurnLengthMm: "30",
  leadLengthMm: "150",
  coilCount: "12",
  temperatureC: "120",
  scrapPercent: "3",
  currentA: "10",
} as const;
