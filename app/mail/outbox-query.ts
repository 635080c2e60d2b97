/** The query of GET /api/v1/outbox: how many of the newest messages. Pure. */
import { z } from "zod";
import { pageSizeParam } from "~/lib/search-params";

export const outboxQuerySchema = z.object({
  limit: pageSizeParam("limit", 500, 100),
});
