/**
 * What a builder sends to see and apply substitutes from stock: the area tolerance (in %,
 * `?tolerance=` of the API and the page) and the chosen wire and strands. One set of Zod
 * schemas for the API and the design page (Conform).
 */
import { z } from "zod";
import { formNumber } from "~/lib/number-text";
import {
  DEFAULT_AREA_TOLERANCE,
  MAX_AREA_TOLERANCE,
  MAX_SUBSTITUTE_STRANDS,
} from "./wire-substitutes";

const maxPercent = MAX_AREA_TOLERANCE * 100;

/** The tolerance on copper area, %: 0–25, default 3. */
export const tolerancePercentField = z.preprocess(
  formNumber,
  z
    .number({ error: "Give the tolerance as a number of per cent." })
    .refine(Number.isFinite, "Give the tolerance as a number of per cent.")
    .pipe(
      z
        .number()
        .min(0, "The tolerance cannot be negative.")
        .max(maxPercent, `The tolerance is at most ${maxPercent} %.`),
    )
    .default(DEFAULT_AREA_TOLERANCE * 100),
);

export const substituteQuerySchema = z.object({
  tolerance: tolerancePercentField,
});

/** The substitute to apply: a wire item's SKU and the strands in hand. */
export const substituteChoiceSchema = z.object({
  sku: z
    .string({ error: "Choose the wire (its SKU)." })
    .trim()
    .min(1, "Choose the wire (its SKU).")
    .max(40),
  strands: z.preprocess(
    formNumber,
    z
      .number({ error: "Give the strands in hand as a whole number." })
      .int("Give the strands in hand as a whole number.")
      .min(1, "At least 1 strand in hand.")
      .max(
        MAX_SUBSTITUTE_STRANDS,
        `At most ${MAX_SUBSTITUTE_STRANDS} strands in hand.`,
      ),
  ),
});

/** The page's "Use this" form: which line (its position), the choice and the tolerance it was proposed at. */
export const substituteFormSchema = substituteChoiceSchema.extend({
  line: z.preprocess(
    formNumber,
    z
      .number({ error: "Say which line." })
      .int("Say which line.")
      .min(1, "Say which line."),
  ),
  tolerance: tolerancePercentField,
});

/** The design page's `?tolerance=`: the value to use, what was typed, and its message when it could not be used. */
export interface SubstituteQuery {
  tolerancePercent: number;
  typed: string;
  error?: string;
}

/** Reads the page's `?tolerance=`; a bad value falls back to the default, with its message. */
export function readSubstituteQuery(search: URLSearchParams): SubstituteQuery {
  const typed = search.get("tolerance") ?? "";
  const parsed = tolerancePercentField.safeParse(typed);
  return parsed.success
    ? { tolerancePercent: parsed.data, typed }
    : {
        tolerancePercent: DEFAULT_AREA_TOLERANCE * 100,
        typed,
        error: parsed.error.issues[0]?.message,
      };
}
