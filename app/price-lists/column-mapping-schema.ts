/**
 * The column mapping's Zod schema, apart from column-mapping.ts so the import page
 * (which checks a mapping with checkColumnMapping) loads no Zod: see
 * docs/decisions/051-precompressed-assets-and-page-weight.md.
 */
import { z } from "zod";
import { priceListFieldKeys } from "./column-mapping";

/** The mapping as the API and the saved supplier settings take it. */
export const columnMappingSchema = z
  .array(
    z.object({
      header: z.string().max(200),
      field: z.enum(priceListFieldKeys),
    }),
  )
  .max(priceListFieldKeys.length);
