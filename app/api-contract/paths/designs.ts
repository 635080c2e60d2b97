/**
 * Motor designs in the contract: the list and one design, adding a design, revisions
 * (reading, changing a draft, starting the next, releasing), a revision's costing,
 * substitutes from stock for a coil line, and the design and stock-value insight.
 */
import { z } from "zod";
import type { ZodOpenApiPathsObject } from "zod-openapi";
import {
  designCostingQuerySchema,
  designListQuerySchema,
} from "~/designs/design-queries";
import {
  newDesignSchema,
  revisionUpdateSchema,
} from "~/designs/design-schemas";
import {
  substituteChoiceSchema,
  substituteQuerySchema,
} from "~/designs/wire-substitute-schemas";
import { insightQueryFieldsSchema } from "~/insight/what-if";
import { apiOperation, countedAnswer, jsonAnswer } from "../operation";
import {
  createdDesignSchema,
  designCostingSchema,
  designInsightListSchema,
  designListSchema,
  designRevisionSchema,
  designSchema,
  releasedRevisionSchema,
  startedRevisionSchema,
  stockValueSchema,
  wireSubstitutesSchema,
} from "../schemas/designs";

const tag = "Designs";

const designId = z
  .number()
  .int()
  .min(1)
  .meta({ description: "The design's number.", example: 1 });
const revision = z
  .number()
  .int()
  .min(1)
  .meta({ description: "The revision's number (1, 2, 3 …).", example: 1 });

const designPath = z.object({ designId });
const revisionPath = z.object({ designId, revision });
const linePath = z.object({
  designId,
  revision,
  line: z.number().int().min(1).meta({
    description: "The line's position in the revision, from 1.",
    example: 1,
  }),
});

const noRevision = "No such design or revision.";

export const designPaths: ZodOpenApiPathsObject = {
  "/api/v1/designs": {
    get: apiOperation({
      operationId: "listDesigns",
      summary: "A page of designs",
      description:
        "Designs by name, each with its revisions (newest first). The total is in `X-Total-Count`.",
      tag,
      caller: "signedIn",
      query: designListQuerySchema,
      answers: { 200: countedAnswer("A page of designs.", designListSchema) },
    }),
    post: apiOperation({
      operationId: "createDesign",
      summary: "Add a design",
      description:
        "Makes the design with revision 1 as a draft, without lines; add them with `PUT …/revisions/1`.",
      tag,
      caller: "editDesigns",
      body: newDesignSchema,
      answers: { 201: jsonAnswer("The new design.", createdDesignSchema) },
      refusals: { 409: "A design with that name already exists." },
    }),
  },
  "/api/v1/designs/{designId}": {
    get: apiOperation({
      operationId: "getDesign",
      summary: "One design with its revisions",
      tag,
      caller: "signedIn",
      path: designPath,
      answers: { 200: jsonAnswer("The design.", designSchema) },
      refusals: { 404: "No design with that number." },
    }),
  },
  "/api/v1/designs/{designId}/revisions": {
    post: apiOperation({
      operationId: "startDesignRevision",
      summary: "Start the next revision",
      description:
        "The next revision, a draft copy of the latest one (its fields and lines).",
      tag,
      caller: "editDesigns",
      path: designPath,
      answers: { 201: jsonAnswer("The new draft.", startedRevisionSchema) },
      refusals: {
        404: "No design with that number.",
        409: "The latest revision is still a draft: change or release it first.",
      },
    }),
  },
  "/api/v1/designs/{designId}/revisions/{revision}": {
    get: apiOperation({
      operationId: "getDesignRevision",
      summary: "One revision with its lines",
      tag,
      caller: "signedIn",
      path: revisionPath,
      answers: { 200: jsonAnswer("The revision.", designRevisionSchema) },
      refusals: { 404: noRevision },
    }),
    put: apiOperation({
      operationId: "changeDesignRevision",
      summary: "Change a draft revision",
      description:
        "Changes the fields the body names (the others stay as they are) and, when `lines` is given, replaces the whole list of lines. A line names its item by SKU; an unknown or archived item, or one of the wrong kind, is refused with 400 beside `lines[i].sku`.",
      tag,
      caller: "editDesigns",
      path: revisionPath,
      body: revisionUpdateSchema,
      answers: {
        200: jsonAnswer("The changed revision.", designRevisionSchema),
      },
      refusals: {
        404: noRevision,
        409: "The revision is released and cannot be changed: start a new revision.",
      },
    }),
  },
  "/api/v1/designs/{designId}/revisions/{revision}/release": {
    post: apiOperation({
      operationId: "releaseDesignRevision",
      summary: "Release a draft revision",
      description:
        "Locks the draft for good: from then on it can be built and never changes.",
      tag,
      caller: "releaseDesigns",
      path: revisionPath,
      answers: {
        200: jsonAnswer("The revision, now released.", releasedRevisionSchema),
      },
      refusals: {
        404: noRevision,
        409: "The revision is released already, or has no lines.",
      },
    }),
  },
  "/api/v1/designs/{designId}/revisions/{revision}/costing": {
    get: apiOperation({
      operationId: "getDesignCosting",
      summary: "The costing of a revision",
      description:
        "Every line priced for the number of motors (quantity breaks) at the best supplier price on the day, or at the moving average cost of stock; the split, cost per N·m, coil figures, the first-order torque estimate and the design's checks.",
      tag,
      caller: "signedIn",
      path: revisionPath,
      query: designCostingQuerySchema,
      answers: { 200: jsonAnswer("The costing.", designCostingSchema) },
      refusals: { 404: noRevision },
    }),
  },
  "/api/v1/designs/{designId}/revisions/{revision}/lines/{line}/substitutes": {
    get: apiOperation({
      operationId: "listWireSubstitutes",
      summary: "Wire in stock that can stand in for a coil line's wire",
      description:
        "Active wire items of the same conductor with stock on hand, in strand counts whose copper area is within `tolerance` % of the line's, rated for the design's insulation class and fitting the slot no worse than the line does.",
      tag,
      caller: "signedIn",
      path: linePath,
      query: substituteQuerySchema,
      answers: { 200: jsonAnswer("The substitutes.", wireSubstitutesSchema) },
      refusals: {
        404: "No such design, revision or line.",
        409: "The line is not a coil line: only coil lines have substitutes.",
      },
    }),
    post: apiOperation({
      operationId: "applyWireSubstitute",
      summary: "Use a substitute on a coil line",
      description:
        "On a draft the line changes in place (200). On a released revision a new draft revision is made, a copy with that line changed (201). Both answer the revision that changed.",
      tag,
      caller: "editDesigns",
      path: linePath,
      query: substituteQuerySchema,
      body: substituteChoiceSchema,
      answers: {
        200: jsonAnswer("The draft, changed.", designRevisionSchema),
        201: jsonAnswer("The new draft revision.", designRevisionSchema),
      },
      refusals: {
        404: "No such design, revision or line.",
        409: "Nothing was written: the design has a draft already, the choice is not among the current substitutes, the line is not a coil line, or it changed meanwhile.",
      },
    }),
  },
  "/api/v1/insight/designs": {
    get: apiOperation({
      operationId: "listDesignInsight",
      summary: "Cost per motor and per N·m of the released designs",
      description:
        "The latest released revision of each design, newest design first, costed for `quantity` motors on `date` at the price `basis`. A read-only what-if (nothing is saved): `copperBase` / `aluminiumBase` per kg stand in for the stored metal bases in the company currency, and `endTurn.<designId>` (0 to 5, at most 3 decimals, e.g. `endTurn.1=1.2`) scales that design's end-turn lengths; each design then also carries `asStored`. `history=1` adds `costHistory`. The total is in `X-Total-Count`.",
      tag,
      caller: "signedIn",
      // `endTurn.<designId>` keys are gathered into `endTurn` before this schema reads them;
      // a parameter name with a design id in it has no place in OpenAPI, so the description
      // tells of them.
      query: insightQueryFieldsSchema.omit({ endTurn: true }),
      answers: {
        200: countedAnswer(
          "A page of costed designs.",
          designInsightListSchema,
        ),
      },
    }),
  },
  "/api/v1/insight/stock-value": {
    get: apiOperation({
      operationId: "getStockValue",
      summary: "What the store is worth",
      description:
        "On hand × moving average cost, by kind and by location, the reserved value, items below their reorder point, open alerts, and the value at the end of each of the last 26 weeks (Monday-started, UTC).",
      tag,
      caller: "signedIn",
      answers: { 200: jsonAnswer("The stock value.", stockValueSchema) },
    }),
  },
};
