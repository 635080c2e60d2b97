/** The shape every paged list of the API answers with: its rows, the page, its size and the total. */
import { z } from "zod";

export function pageOf(id: string, rowsKey: string, row: z.ZodType) {
  return z
    .object({
      [rowsKey]: z.array(row),
      page: z.number().int().min(1),
      pageSize: z.number().int().min(1),
      total: z
        .number()
        .int()
        .min(0)
        .meta({ description: "Rows matching, on every page." }),
    })
    .meta({ id, description: `A page of ${rowsKey}.` });
}
