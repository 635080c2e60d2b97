/**
 * What a builder may send for a design revision and its lines: one set of Zod
 * schemas for the pages (Conform) and the API. Numbers arrive as text from
 * forms and as numbers from JSON; both are read here.
 */
import { z } from "zod";
import { phaseConnections } from "~/engineering/motor-constants";
import { windingInfeasibility } from "~/engineering/winding-factor";
import { formNumber } from "~/lib/number-text";
import { insulationClasses } from "./insulation-classes";

const number = (label: string) =>
  z.preprocess(
    formNumber,
    z
      .number({ error: `Give the ${label} as a number.` })
      .refine(Number.isFinite, `Give the ${label} as a number.`),
  );

const whole = (label: string, min: number, max: number) =>
  number(label).pipe(
    z
      .number()
      .int(`The ${label} must be a whole number.`)
      .min(min, `The ${label} must be at least ${min}.`)
      .max(max, `The ${label} must be at most ${max}.`),
  );

const ranged = (label: string, min: number, max: number, unit: string) =>
  number(label).pipe(
    z
      .number()
      .min(min, `The ${label} must be at least ${min} ${unit}.`)
      .max(max, `The ${label} must be at most ${max} ${unit}.`),
  );

const positive = (label: string, max: number, unit: string) =>
  number(label).pipe(
    z
      .number()
      .positive(`The ${label} must be more than 0 ${unit}.`)
      .max(max, `The ${label} must be at most ${max} ${unit}.`),
  );

export { insulationClasses };

export const revisionFieldsSchema = z.object({
  poles: whole("pole count", 2, 500).refine(
    (poles) => poles % 2 === 0,
    "A motor has an even number of poles.",
  ),
  slots: whole("slot count", 1, 1000),
  /** RMS phase current of a sinusoidal drive at the rated point, A. */
  ratedCurrentA: positive("rated current", 10_000, "A"),
  ratedTorqueNm: z.preprocess(
    (value) => (value === "" || value === null ? undefined : value),
    positive("rated torque", 100_000, "N·m").optional(),
  ),
  torqueBasis: z.enum(["measured", "estimated"], {
    error: "Say whether the torque is measured or estimated.",
  }),
  insulationClassC: number("insulation class").pipe(
    z
      .number()
      .refine(
        (value) => (insulationClasses as readonly number[]).includes(value),
        `Choose an insulation class: ${insulationClasses.join(", ")} °C.`,
      ),
  ),
  slotAreaMm2: z.preprocess(
    (value) => (value === "" || value === null ? undefined : value),
    positive("slot area", 100_000, "mm²").optional(),
  ),
  slotLinerAreaMm2: z.preprocess(
    (value) => (value === "" || value === null ? undefined : value),
    ranged("slot liner area", 0, 100_000, "mm²").optional(),
  ),
  coilSidesPerSlot: whole("coil sides per slot", 1, 2).default(2),
  phases: whole("phase count", 1, 12).default(3),
  windingLayers: whole("number of winding layers", 1, 2).default(2),
  phaseConnection: z
    .enum(phaseConnections, {
      error: "Say whether the phases are joined in star or in delta.",
    })
    .default("star"),
  parallelPaths: whole("number of parallel paths", 1, 100).default(1),
  ratedSpeedRpm: z.preprocess(
    (value) => (value === "" || value === null ? undefined : value),
    positive("rated speed", 1_000_000, "rpm").optional(),
  ),
  airGapRadiusMm: z.preprocess(
    (value) => (value === "" || value === null ? undefined : value),
    positive("air-gap radius", 10_000, "mm").optional(),
  ),
  airGapFluxDensityT: z.preprocess(
    (value) => (value === "" || value === null ? undefined : value),
    positive("air-gap flux density", 3, "T").optional(),
  ),
  poleCoverage: z.preprocess(
    (value) => (value === "" || value === null ? undefined : value),
    positive("fraction of conductors under the poles", 1, "").optional(),
  ),
  notes: z
    .string()
    .trim()
    .max(1000, "Notes are at most 1,000 characters.")
    .default(""),
});

/** The winding fields of a revision, as `windingFieldIssue` reads them. */
type WindingFields = Pick<
  RevisionFields,
  "slots" | "poles" | "phases" | "windingLayers" | "phaseConnection"
>;

/** The revision field each refusal of the winding-factor calculation is about. */
const windingFieldOf: Record<string, keyof WindingFields> = {
  slots: "slots",
  poles: "poles",
  phases: "phases",
  layers: "windingLayers",
  coilPitch: "slots",
};

/**
 * Why these fields cannot make a balanced winding, with the field to show it beside; null
 * when they can, or when the winding is not one the winding factor covers (one phase, as
 * a moving-coil actuator; an even phase count): those are allowed and simply get no
 * winding factor. A delta needs 3 or more phases.
 */
export function windingFieldIssue(
  fields: WindingFields,
): { field: keyof WindingFields; message: string } | null {
  if (fields.phaseConnection === "delta" && fields.phases < 3)
    return {
      field: "phaseConnection",
      message: "A delta joins 3 or more phases; one phase has no delta.",
    };
  if (fields.phases < 3 || fields.phases % 2 === 0) return null;
  const refusal = windingInfeasibility({
    slots: fields.slots,
    poles: fields.poles,
    layers: fields.windingLayers,
    phases: fields.phases,
  });
  return refusal
    ? {
        field: windingFieldOf[refusal.field] ?? "slots",
        message: refusal.message,
      }
    : null;
}

/** Adds the winding's refusal to a form's issues, beside its field. */
function checkWinding(fields: WindingFields, context: z.RefinementCtx): void {
  const issue = windingFieldIssue(fields);
  if (issue)
    context.addIssue({
      code: "custom",
      path: [issue.field],
      message: issue.message,
    });
}

/** The message when the slot liner and separator would take the whole slot. */
export const slotLinerTooLargeMessage =
  "The slot liner and separator area must be less than the slot area: nothing would be left for the wire.";

/** Refuses a liner area at or above the slot area, beside the liner field (both must be given). */
function slotLinerWithinSlot(
  fields: { slotAreaMm2?: number; slotLinerAreaMm2?: number },
  context: z.RefinementCtx,
) {
  if (
    fields.slotAreaMm2 !== undefined &&
    fields.slotLinerAreaMm2 !== undefined &&
    fields.slotLinerAreaMm2 >= fields.slotAreaMm2
  )
    context.addIssue({
      code: "custom",
      path: ["slotLinerAreaMm2"],
      message: slotLinerTooLargeMessage,
    });
}

/** Checks the fields together: a winding that can be balanced, the liner inside the slot. */
function checkRevisionFields(
  fields: WindingFields & { slotAreaMm2?: number; slotLinerAreaMm2?: number },
  context: z.RefinementCtx,
): void {
  checkWinding(fields, context);
  slotLinerWithinSlot(fields, context);
}

/** The revision form (page): the fields, checked together. */
export const revisionFormSchema =
  revisionFieldsSchema.superRefine(checkRevisionFields);

export const newDesignSchema = revisionFieldsSchema
  .extend({
    name: z
      .string({ error: "Give the design a name." })
      .trim()
      .min(1, "Give the design a name.")
      .max(120, "A name is at most 120 characters."),
    description: z
      .string()
      .trim()
      .max(1000, "A description is at most 1,000 characters.")
      .default(""),
    motorType: z
      .string()
      .trim()
      .max(60, "The motor type is at most 60 characters.")
      .default(""),
  })
  .superRefine(checkRevisionFields);

const sku = z
  .string({ error: "Choose the item (its SKU)." })
  .trim()
  .min(1, "Choose the item (its SKU).")
  .max(40);

export const coilLineSchema = z.object({
  kind: z.literal("coil"),
  sku,
  turns: whole("number of turns", 1, 100_000),
  strandsInHand: whole("number of strands in hand", 1, 200),
  activeLengthMm: positive("active length", 10_000, "mm"),
  endTurnLengthMm: ranged("end-turn length", 0, 10_000, "mm"),
  leadLengthMm: ranged("lead length", 0, 100_000, "mm"),
  coilsPerMotor: whole("number of coils per motor", 1, 1000),
  scrapPercent: ranged("scrap", 0, 100, "%"),
  operatingTemperatureC: ranged("operating temperature", -60, 400, "°C"),
});

export const magnetLineSchema = z.object({
  kind: z.literal("magnet"),
  sku,
  piecesPerMotor: whole("number of pieces per motor", 1, 10_000),
  operatingTemperatureC: z.preprocess(
    (value) => (value === "" || value === null ? undefined : value),
    ranged("magnet temperature", -60, 400, "°C").optional(),
  ),
});

export const partLineSchema = z.object({
  kind: z.literal("part"),
  sku,
  quantityPerMotor: positive("quantity per motor", 1_000_000, "").refine(
    (value) => Math.abs(value * 1000 - Math.round(value * 1000)) < 1e-6,
    "Give the quantity to at most 3 decimals.",
  ),
});

export const designLineSchema = z.discriminatedUnion(
  "kind",
  [coilLineSchema, magnetLineSchema, partLineSchema],
  { error: "A line is a coil, magnet or part line." },
);

export type RevisionFields = z.infer<typeof revisionFieldsSchema>;
export type NewDesign = z.infer<typeof newDesignSchema>;

/** The new-design form: its fields, and a winding that can be balanced. */
export const newDesignFormSchema = newDesignSchema.superRefine(checkWinding);
export type DesignLineInput = z.infer<typeof designLineSchema>;

/** A whole revision as the API's PUT takes it: the fields, and the lines when given. */
export const revisionUpdateSchema = revisionFieldsSchema
  .partial()
  .extend({
    lines: z
      .array(designLineSchema)
      .max(200, "A revision has at most 200 lines.")
      .optional(),
  })
  .superRefine(slotLinerWithinSlot);
