/**
 * The coil estimator page's form: flat fields for people, turned into the
 * request of POST /api/v1/coil-estimates. The bounds are the API's own.
 */
import { z } from "zod";
import {
  coilFrequencyFields,
  coilNumberFields,
  conductorSchema,
  iecDiameterField,
  insulationSchema,
  litzWireSchema,
  rectangularWireSchema,
  thermalFields,
  type CoilEstimateRequest,
} from "./estimate-requests";

/** How the conductor is made: one round wire (AWG or IEC), litz of such strands, or flat wire. */
export const wireForms = ["round", "litz", "rectangular"] as const;

export const coilEstimatorFormSchema = z
  .object({
    conductor: conductorSchema,
    wireForm: z.enum(wireForms, { error: "Choose round, litz or flat wire." }),
    // Not on the form for flat wire, which has its own sizes.
    standard: z
      .enum(["AWG", "IEC"], { error: "Choose AWG or IEC." })
      .default("IEC"),
    awgSize: z.string().optional(),
    iecDiameterMm: iecDiameterField.optional(),
    insulation: insulationSchema.optional(),
    litzStrands: litzWireSchema.shape.strands.optional(),
    litzBunchingSteps: litzWireSchema.shape.bunchingSteps,
    flatThicknessMm: rectangularWireSchema.shape.thicknessMm.optional(),
    flatWidthMm: rectangularWireSchema.shape.widthMm.optional(),
    flatEdgewise: z.enum(["flat", "edge"]).default("flat"),
    ...coilNumberFields,
    ...coilFrequencyFields,
    ambientC: thermalFields.ambientC.optional(),
    thermalResistanceKPerW: thermalFields.thermalResistanceKPerW,
    temperatureRiseK: thermalFields.temperatureRiseK,
  })
  .superRefine((value, context) => {
    const issue = (path: string, message: string) =>
      context.addIssue({ code: "custom", path: [path], message });
    const needsRoundSize = value.wireForm !== "rectangular";
    if (needsRoundSize && value.standard === "AWG" && !value.awgSize) {
      issue("awgSize", "Choose the AWG size.");
    }
    if (
      needsRoundSize &&
      value.standard === "IEC" &&
      value.iecDiameterMm === undefined
    ) {
      issue("iecDiameterMm", "Choose the nominal diameter.");
    }
    if (value.wireForm === "litz" && value.litzStrands === undefined) {
      issue("litzStrands", "Give the number of strands.");
    }
    if (value.wireForm === "rectangular") {
      if (value.flatThicknessMm === undefined)
        issue("flatThicknessMm", "Give the thickness.");
      if (value.flatWidthMm === undefined)
        issue("flatWidthMm", "Give the width.");
    }
    const awgBuilds = ["single", "heavy", "triple"];
    const takesAwgBuild =
      value.wireForm !== "rectangular" && value.standard === "AWG";
    if (
      value.insulation &&
      awgBuilds.includes(value.insulation) !== takesAwgBuild
    ) {
      issue(
        "insulation",
        takesAwgBuild
          ? "AWG wire takes a film build."
          : "IEC and flat wire take a grade.",
      );
    }
    const hasResistance = value.thermalResistanceKPerW != null;
    const hasRise = value.temperatureRiseK != null;
    if (hasResistance && hasRise) {
      issue(
        "temperatureRiseK",
        "Give either the thermal resistance or the temperature rise, not both.",
      );
    }
    if ((hasResistance || hasRise) && value.ambientC === undefined) {
      issue("ambientC", "Give the ambient temperature.");
    }
    if ((hasResistance || hasRise) && value.currentA == null) {
      issue("currentA", "Give a current to find the operating temperature.");
    }
  });

export type CoilEstimatorForm = z.infer<typeof coilEstimatorFormSchema>;

function roundWire(form: CoilEstimatorForm) {
  return form.standard === "AWG"
    ? { standard: "AWG" as const, size: form.awgSize ?? "" }
    : { standard: "IEC" as const, diameterMm: form.iecDiameterMm ?? 0 };
}

function wireOfForm(form: CoilEstimatorForm): CoilEstimateRequest["wire"] {
  if (form.wireForm === "litz") {
    return {
      standard: "litz",
      strands: form.litzStrands ?? 0,
      strandWire: roundWire(form),
      bunchingSteps: form.litzBunchingSteps,
    };
  }
  if (form.wireForm === "rectangular") {
    return {
      standard: "rectangular",
      thicknessMm: form.flatThicknessMm ?? 0,
      widthMm: form.flatWidthMm ?? 0,
      edgewise: form.flatEdgewise === "edge",
    };
  }
  return roundWire(form);
}

function thermalOfForm(
  form: CoilEstimatorForm,
): CoilEstimateRequest["thermal"] {
  if (form.ambientC === undefined) return null;
  if (form.thermalResistanceKPerW != null) {
    return {
      ambientC: form.ambientC,
      thermalResistanceKPerW: form.thermalResistanceKPerW,
    };
  }
  if (form.temperatureRiseK != null) {
    return { ambientC: form.ambientC, temperatureRiseK: form.temperatureRiseK };
  }
  return null;
}

export function coilRequestFromForm(
  form: CoilEstimatorForm,
): CoilEstimateRequest {
  return {
    conductor: form.conductor,
    wire: wireOfForm(form),
    insulation: form.insulation ?? null,
    turns: form.turns,
    strandsInHand: form.strandsInHand,
    activeLengthMm: form.activeLengthMm,
    endTurnLengthMm: form.endTurnLengthMm,
    leadLengthMm: form.leadLengthMm,
    coilCount: form.coilCount,
    temperatureC: form.temperatureC,
    scrapPercent: form.scrapPercent,
    currentA: form.currentA,
    frequencyHz: form.frequencyHz,
    layersPerCoil: form.layersPerCoil,
    thermal: thermalOfForm(form),
  };
}

export {
  coilEstimatorDefaults,
  formFieldOfApiField,
} from "./coil-estimator-fields";
