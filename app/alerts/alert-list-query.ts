/** The query of GET /api/v1/alerts: which alerts (open, closed or all) and the page. Pure. */
import { z } from "zod";
import { pageParam, pageSizeParam } from "~/lib/search-params";

export const alertListQuerySchema = z.object({
  status: z
    .enum(["open", "closed", "all"], {
      error: "The status is open, closed or all.",
    })
    .default("open"),
  page: pageParam,
  perPage: pageSizeParam("perPage", 200, 50),
});
