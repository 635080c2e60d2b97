/** Filled in by its group: see app/api-contract/paths/items.ts for the pattern. */
import type { ZodOpenApiPathsObject } from "zod-openapi";

export const pricePaths: ZodOpenApiPathsObject = {};
