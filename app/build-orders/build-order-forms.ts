/**
 * What the build-order API and pages accept, as Zod schemas shared by both: the JSON
 * bodies of the API, and the page forms (text fields, a decimal comma allowed) turned
 * into the same values. Quantities become thousandths of their unit.
 */
import { formatNumber } from "~/lib/format";
import { z } from "zod";
import { formNumber } from "~/lib/number-text";
import { quantityFromNumber } from "~/lib/decimal-amounts";
import { isCalendarDate } from "~/lib/calendar-days";
import { maxMotorsPerOrder } from "./build-order-requirements";

const wholeNumber = (label: string, max: number) =>
  z
    .number({
      error: (issue) =>
        issue.input === undefined
          ? `Give the ${label}.`
          : `The ${label} must be a whole number.`,
    })
    .int(`The ${label} must be a whole number.`)
    .min(1, `The ${label} must be at least 1.`)
    .max(max, {
      error: () => `The ${label} must be at most ${formatNumber(max)}.`,
    });

const motors = wholeNumber("number of motors", maxMotorsPerOrder);

const note = z
  .string({ error: "The note must be text." })
  .trim()
  .max(500, "Use at most 500 characters.")
  .optional()
  .transform((value) => value || undefined);

const amount = (label: string) =>
  z
    .number({
      error: (issue) =>
        issue.input === undefined
          ? `Give the ${label}.`
          : `The ${label} must be a number.`,
    })
    .gt(0, `The ${label} must be more than 0.`)
    .max(1_000_000_000, `The ${label} is out of range.`)
    .transform((value, context) => {
      const scaled = quantityFromNumber(value);
      if (scaled === null) {
        context.addIssue({
          code: "custom",
          message: `The ${label} has at most 3 decimals.`,
        });
        return z.NEVER;
      }
      return scaled;
    });

const code = (label: string, max: number) =>
  z
    .string({ error: `Give the ${label}.` })
    .trim()
    .min(1, `Give the ${label}.`)
    .max(max, `The ${label} has at most ${max} characters.`);

/** A day as "YYYY-MM-DD": when building starts (the buying plan needs the stock by then). */
const plannedStartDay = z
  .string({ error: "The planned start must be a day as YYYY-MM-DD." })
  .trim()
  .refine(
    (value) => isCalendarDate(value),
    "The planned start must be a real day as YYYY-MM-DD.",
  );

/** POST /api/v1/build-orders */
export const buildOrderCreateSchema = z.object({
  designId: wholeNumber("design id", 2_147_483_647),
  revision: wholeNumber("revision", 32_767),
  quantity: motors,
  note,
  plannedStart: plannedStartDay.optional(),
});
export type BuildOrderCreateInput = z.output<typeof buildOrderCreateSchema>;

/** POST /api/v1/build-orders/:id/reserve */
export const reserveRequestSchema = z.object({
  partial: z
    .boolean({ error: "partial must be true or false." })
    .optional()
    .default(false),
});

const issueFields = {
  sku: code("SKU", 40),
  lot: z
    .string({ error: "The lot must be text." })
    .trim()
    .max(40, "The lot has at most 40 characters.")
    .optional()
    .transform((value) => value || undefined),
  location: code("location", 20),
  quantity: amount("quantity").optional(),
  grossKg: amount("gross weight").optional(),
  note,
};

function refineIssue(
  value: { quantity?: bigint; grossKg?: bigint },
  context: z.RefinementCtx,
) {
  if (value.quantity === undefined && value.grossKg === undefined) {
    context.addIssue({
      code: "custom",
      path: ["quantity"],
      message: "Give the quantity, or the spool's gross weight now.",
    });
  }
  if (value.quantity !== undefined && value.grossKg !== undefined) {
    context.addIssue({
      code: "custom",
      path: ["grossKg"],
      message: "Give the quantity or the spool's gross weight, not both.",
    });
  }
}

/** POST /api/v1/build-orders/:id/issue: from one lot at one location, by quantity or by weighing the spool back. */
export const issueRequestSchema = z
  .object(issueFields)
  .superRefine(refineIssue);
export type IssueRequest = z.output<typeof issueRequestSchema>;

/** POST /api/v1/build-orders/:id/cancel and /complete */
export const closeRequestSchema = z.object({ note });

/** PATCH /api/v1/build-orders/:id: a new number of motors, a new planned start (null clears it), or both. */
export const buildOrderChangeSchema = z
  .object({
    quantity: motors.optional(),
    plannedStart: plannedStartDay.nullable().optional(),
  })
  .refine(
    (value) => value.quantity !== undefined || value.plannedStart !== undefined,
    {
      message: "Give the quantity, the planned start, or both.",
      path: ["quantity"],
    },
  );
export type BuildOrderChange = z.output<typeof buildOrderChangeSchema>;

// ——— The pages' forms: text fields turned into the API's values ———

function withoutEmpty(values: Record<string, unknown>) {
  for (const [key, value] of Object.entries(values))
    if (value === "") values[key] = undefined;
  return values;
}

const formObject = (values: unknown) =>
  values && typeof values === "object"
    ? { ...(values as Record<string, unknown>) }
    : {};

/** The new-build form: the released revision chosen as "designId/revision". */
export const createFormSchema = z.preprocess(
  (values) => {
    const form = formObject(values);
    return withoutEmpty({
      designRevision: form.designRevision,
      quantity: formNumber(form.quantity),
      note: form.note,
      plannedStart: form.plannedStart,
    });
  },
  z
    .object({
      designRevision: z
        .string({ error: "Choose a released design revision." })
        .regex(/^\d+\/\d+$/, "Choose a released design revision."),
      quantity: motors,
      note,
      plannedStart: plannedStartDay.optional(),
    })
    .transform(({ designRevision, ...rest }) => {
      const [designId, revision] = designRevision.split("/");
      return {
        designId: Number(designId),
        revision: Number(revision),
        ...rest,
      };
    }),
);

/** The design-revision field of the new-build form is one choice; API fields map onto it. */
export function createFormFieldOf(field: string | undefined): string {
  if (field === "designId" || field === "revision") return "designRevision";
  return field ?? "";
}

export const reserveFormSchema = z.object({
  intent: z.literal("reserve"),
  partial: z
    .literal("on")
    .optional()
    .transform((value) => value === "on"),
});

/** The issue form: the held stock chosen as "sku|lot|location", a quantity or the spool's gross weight. */
export const issueFormSchema = z.preprocess(
  (values) => {
    const form = formObject(values);
    const spot = typeof form.spot === "string" ? form.spot : "";
    const [sku, lot, location] = spot.split("|");
    return withoutEmpty({
      intent: form.intent,
      spot: spot || undefined,
      sku: sku || undefined,
      lot: lot || undefined,
      location: location || undefined,
      quantity: formNumber(form.quantity),
      grossKg: formNumber(form.grossKg),
      note: form.note,
    });
  },
  z
    .object({
      intent: z.literal("issue"),
      spot: z.string({ error: "Choose the lot and location to issue from." }),
      ...issueFields,
    })
    .superRefine(refineIssue),
);

/** Where a refusal about the lot or location shows on the issue form (they are one choice there). */
export function issueFormFieldOf(field: string | undefined): string {
  if (field === "lot" || field === "location" || field === "sku") return "spot";
  return field ?? "";
}

export const cancelFormSchema = z.object({
  intent: z.literal("cancel"),
  note,
});

export const completeFormSchema = z.object({
  intent: z.literal("complete"),
  note,
});

export const quantityFormSchema = z.preprocess(
  (values) => {
    const form = formObject(values);
    return withoutEmpty({
      intent: form.intent,
      quantity: formNumber(form.quantity),
    });
  },
  z.object({ intent: z.literal("quantity"), quantity: motors }),
);

/** The planned-start form of the order page: an empty day clears it. */
export const plannedStartFormSchema = z.preprocess(
  (values) => {
    const form = formObject(values);
    return { intent: form.intent, plannedStart: form.plannedStart || null };
  },
  z.object({
    intent: z.literal("plannedStart"),
    plannedStart: plannedStartDay.nullable(),
  }),
);

/** Steps of the order page, by the form's intent. */
export const buildOrderIntents = [
  "reserve",
  "issue",
  "cancel",
  "complete",
  "quantity",
  "plannedStart",
] as const;
export type BuildOrderIntent = (typeof buildOrderIntents)[number];

export const intentSchemas = {
  reserve: reserveFormSchema,
  issue: issueFormSchema,
  cancel: cancelFormSchema,
  complete: completeFormSchema,
  quantity: quantityFormSchema,
  plannedStart: plannedStartFormSchema,
} as const;

export function isBuildOrderIntent(value: unknown): value is BuildOrderIntent {
  return (buildOrderIntents as readonly unknown[]).includes(value);
}
