/** The query of GET /api/v1/scan-lookup: the text a scanner or a person typed. Pure. */
import { z } from "zod";

export const scanLookupQuerySchema = z.object({
  code: z.string().optional().meta({
    description:
      "What was scanned or typed: a bare code (`L123` for a lot, `BMAIN-A3` for a location), the path `/scan/L123`, or the whole address a label's QR code holds.",
    example: "L123",
  }),
});
