/**
 * What a hold and a release take, for the API and the lot page's forms alike (decision
 * 039): a hold needs its reason, a release may say why. Pure, browser-safe.
 */
import { z } from "zod";

export const holdReasonMaxLength = 300;

export const holdLotSchema = z.object({
  reason: z
    .string({ error: "Say why the lot is on hold." })
    .trim()
    .min(1, "Say why the lot is on hold.")
    .max(holdReasonMaxLength, `Use at most ${holdReasonMaxLength} characters.`),
});

export const releaseLotSchema = z.object({
  reason: z
    .string({ error: "The note must be text." })
    .trim()
    .max(holdReasonMaxLength, `Use at most ${holdReasonMaxLength} characters.`)
    .optional()
    .transform((value) => value || undefined),
});

/** `?sku=` narrows a lot number to one item's lot (lot numbers are unique per item only). */
export const lotQuerySchema = z.object({
  sku: z
    .string({ error: "sku must be text." })
    .trim()
    .min(1, "sku must not be empty.")
    .max(40, "sku has at most 40 characters.")
    .optional(),
});
