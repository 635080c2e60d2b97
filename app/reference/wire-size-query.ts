/** The query of GET /api/v1/wire-sizes: which standard's sizes. Shared by the route and the contract. */
import { z } from "zod";

export const wireSizeQuerySchema = z.object({
  standard: z.enum(["AWG", "IEC"], { error: "standard must be AWG or IEC." }),
});
