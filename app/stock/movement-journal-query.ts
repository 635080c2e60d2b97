/** The movement journal's filters and page, from a query string (page and API share it). */
import { z } from "zod";
import { movementTypes } from "~/db/tables/stock-enums";

const day = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, "Dates are YYYY-MM-DD.")
  .refine(
    (value) => !Number.isNaN(Date.parse(`${value}T00:00:00Z`)),
    "Not a real date.",
  );

export const movementJournalQuerySchema = z.object({
  type: z
    .enum(movementTypes, {
      error: `type must be one of ${movementTypes.join(", ")}.`,
    })
    .optional(),
  sku: z.string().trim().max(40).optional(),
  user: z.string().trim().max(254).optional(),
  from: day.optional(),
  to: day.optional(),
  page: z.coerce
    .number({ error: "page must be a number." })
    .int("page must be a whole number.")
    .min(1, "page starts at 1.")
    .default(1),
  pageSize: z.coerce
    .number({ error: "pageSize must be a number." })
    .int()
    .min(1, "pageSize must be 1 to 500.")
    .max(500, "pageSize must be 1 to 500.")
    .default(50),
});

export type MovementJournalQuery = z.output<typeof movementJournalQuerySchema>;
