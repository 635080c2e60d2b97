/** The movement journal's filters and page, from a query string (page and API share it). */
import { z } from "zod";
import { movementTypes } from "~/db/tables/stock-enums";
import { dayParam, pageParam, pageSizeParam } from "~/lib/search-params";

export const movementJournalQuerySchema = z.object({
  type: z
    .enum(movementTypes, {
      error: `type must be one of ${movementTypes.join(", ")}.`,
    })
    .optional(),
  sku: z.string().trim().max(40).optional(),
  user: z.string().trim().max(254).optional(),
  from: dayParam("from").optional(),
  to: dayParam("to").optional(),
  page: pageParam,
  pageSize: pageSizeParam("pageSize", 500, 50),
});

export type MovementJournalQuery = z.output<typeof movementJournalQuerySchema>;
