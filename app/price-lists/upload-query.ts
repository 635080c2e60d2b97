/**
 * The query of POST /api/v1/price-lists: which of its three modes an upload asks for.
 * Pure: shared by the route and the published contract.
 */
import { z } from "zod";

export const priceListUploadQuerySchema = z.object({
  layout: z.string().optional().meta({
    description:
      '"1": read only the file\'s header row, first data row and sheets (the form needs only file and sheet); nothing is written.',
    example: "1",
  }),
  dryRun: z.string().optional().meta({
    description:
      '"1": check every row and answer a preview; nothing is written. Without it (or with any other value) the upload commits.',
    example: "1",
  }),
});

/** The mode an upload's query asks for. */
export function priceListUploadMode(
  query: z.output<typeof priceListUploadQuerySchema>,
): "layout" | "check" | "commit" {
  if (query.layout === "1") return "layout";
  return query.dryRun === "1" ? "check" : "commit";
}
