/** Suppliers, metal base and currency rates: request schemas shared by pages and API. */
import { z } from "zod";
import {
  ambiguousCurrencySigns,
  currencyCodeFromText,
} from "~/price-lists/currencies";
import { metalBaseFixings } from "~/db/tables/purchase-order-enums";
import { supplierOrderingDefaults } from "./supplier-ordering-defaults";

export { supplierOrderingDefaults };

const currencyHint = "Give the currency as a 3-letter ISO 4217 code, e.g. EUR.";

/** A 3-letter code; € and £ are read as EUR and GBP, $ and other shared signs are asked for as codes. */
export const isoCurrency = z
  .string({ error: currencyHint })
  .overwrite(currencyCodeFromText)
  .superRefine((code, context) => {
    if (/^[A-Z]{3}$/.test(code)) return;
    const sign = code.toLowerCase();
    const shared = Object.hasOwn(ambiguousCurrencySigns, sign)
      ? ambiguousCurrencySigns[sign]
      : undefined;
    context.addIssue({
      code: "custom",
      message: shared
        ? `${code} stands for several currencies (${shared.standsFor}): write ${shared.write}.`
        : currencyHint,
    });
  });

const day = z
  .string({ error: "Give the date as YYYY-MM-DD." })
  .regex(/^\d{4}-\d{2}-\d{2}$/, "Give the date as YYYY-MM-DD.")
  .refine(
    (value) => !Number.isNaN(Date.parse(`${value}T00:00:00Z`)),
    "That is not a real date.",
  );

const price = (label: string, decimals: number) =>
  z
    .number({ error: `Give the ${label} as a number.` })
    .positive(`The ${label} must be more than 0.`)
    .max(1_000_000, `The ${label} is out of range.`)
    .refine(
      (value) =>
        Math.abs(Math.round(value * 10 ** decimals) - value * 10 ** decimals) <
        1e-6,
      `The ${label} has at most ${decimals} decimals.`,
    );

/** How far past the ordered quantity a delivery may go: 0–100 %, to 2 decimals (the column's scale). */
const tolerancePercent = (what: string) =>
  z
    .number({ error: `Give the ${what} tolerance as a number of percent.` })
    .min(0, `The ${what} tolerance cannot be negative.`)
    .max(100, `The ${what} tolerance is at most 100 %.`)
    .refine(
      (value) => Math.abs(Math.round(value * 100) - value * 100) < 1e-6,
      `The ${what} tolerance has at most 2 decimals.`,
    );

/** The supplier's ordering settings, without defaults (the PATCH leaves out what it does not send). */
const orderingFields = {
  orderEmail: z
    .email({ error: "Give a valid e-mail address for orders." })
    .max(254, "The address is at most 254 characters."),
  metalBaseFixedAt: z.enum(metalBaseFixings, {
    error: "The metal base is fixed at order or at delivery.",
  }),
  wireTolerancePercent: tolerancePercent("wire"),
  pieceTolerancePercent: tolerancePercent("piece"),
};

export const supplierSchema = z.object({
  name: z
    .string({ error: "Give the supplier's name." })
    .trim()
    .min(1, "Give the supplier's name.")
    .max(120),
  email: z.email({ error: "Give a valid e-mail address." }).max(254).optional(),
  currency: isoCurrency,
  leadTimeDays: z
    .number({ error: "Give the lead time in days." })
    .int("Give the lead time in whole days.")
    .min(0, "The lead time cannot be negative.")
    .max(730, "The lead time is at most 730 days.")
    .optional(),
  notes: z.string().trim().max(1000, "Use at most 1000 characters.").optional(),
  orderEmail: orderingFields.orderEmail.optional(),
  metalBaseFixedAt: orderingFields.metalBaseFixedAt.default(
    supplierOrderingDefaults.metalBaseFixedAt,
  ),
  wireTolerancePercent: orderingFields.wireTolerancePercent.default(
    supplierOrderingDefaults.wireTolerancePercent,
  ),
  pieceTolerancePercent: orderingFields.pieceTolerancePercent.default(
    supplierOrderingDefaults.pieceTolerancePercent,
  ),
});

export const metalBaseSchema = z.object({
  conductor: z.enum(["copper", "aluminium"], {
    error: "The conductor must be copper or aluminium.",
  }),
  currency: isoCurrency,
  pricePerKg: price("price per kg", 4),
  validFrom: day,
});

export const currencyRateSchema = z.object({
  currency: isoCurrency,
  rate: price("rate", 6),
  validFrom: day,
});

export type SupplierInput = z.output<typeof supplierSchema>;
export type MetalBaseInput = z.output<typeof metalBaseSchema>;
export type CurrencyRateInput = z.output<typeof currencyRateSchema>;

/**
 * A change to a supplier through the API (PATCH): only the fields sent change; null clears
 * an optional one (e-mail, lead time, notes).
 */
export const supplierPatchSchema = z
  .object({
    name: supplierSchema.shape.name.optional(),
    email: supplierSchema.shape.email.nullable(),
    currency: isoCurrency.optional(),
    leadTimeDays: supplierSchema.shape.leadTimeDays.nullable(),
    notes: supplierSchema.shape.notes.nullable(),
    orderEmail: orderingFields.orderEmail.nullable().optional(),
    metalBaseFixedAt: orderingFields.metalBaseFixedAt.optional(),
    wireTolerancePercent: orderingFields.wireTolerancePercent.optional(),
    pieceTolerancePercent: orderingFields.pieceTolerancePercent.optional(),
  })
  .strict()
  .refine((patch) => Object.keys(patch).length > 0, {
    message:
      "Send at least one of name, email, currency, leadTimeDays, notes, orderEmail, metalBaseFixedAt, wireTolerancePercent, pieceTolerancePercent.",
  });

export type SupplierPatch = z.output<typeof supplierPatchSchema>;
