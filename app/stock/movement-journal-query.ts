/** The movement journal's filters and page, from a query string (page, CSV export and API share it). */
import { z } from "zod";
import { movementTypes } from "~/db/tables/stock-enums";
import { keysetCursorParam } from "~/lib/keyset-cursor";
import { dayParam, pageParam, pageSizeParam } from "~/lib/search-params";

export const movementJournalFilterSchema = z.object({
  type: z
    .enum(movementTypes, {
      error: `type must be one of ${movementTypes.join(", ")}.`,
    })
    .optional(),
  /** The item's SKU, exactly (letter case aside). */
  sku: z.string().trim().max(40, "sku is at most 40 characters.").optional(),
  /** A lot number, exactly; with `sku`, that item's lot only. */
  lot: z.string().trim().max(40, "lot is at most 40 characters.").optional(),
  /** A movement's reference ("BO-12", "PO-7"), exactly. */
  reference: z
    .string()
    .trim()
    .max(80, "reference is at most 80 characters.")
    .optional(),
  /** The person who recorded it: their e-mail exactly, or part of their name. */
  user: z
    .string()
    .trim()
    .max(254, "user is at most 254 characters.")
    .optional(),
  from: dayParam("from").optional(),
  to: dayParam("to").optional(),
});

export const movementJournalQuerySchema = movementJournalFilterSchema.extend({
  /** With `after` or `before`, only the page number the answer reports; alone, how many pages to skip. */
  page: pageParam,
  pageSize: pageSizeParam("pageSize", 500, 50),
  after: keysetCursorParam(
    "after",
    "The page of older movements after this cursor (an earlier answer's `nextCursor`), read from the journal's index at that place: a deep page costs what the first does. `page` is then only the number the answer reports.",
  ).optional(),
  before: keysetCursorParam(
    "before",
    "The page of newer movements before this cursor (an earlier answer's `previousCursor`). `page` is then only the number the answer reports.",
  ).optional(),
});

export type MovementJournalFilter = z.output<
  typeof movementJournalFilterSchema
>;
export type MovementJournalQuery = z.output<typeof movementJournalQuerySchema>;
