/** The engineering operations in the contract: the estimates and the reference tables they read. */
import { z } from "zod";
import type { ZodOpenApiPathsObject } from "zod-openapi";
import {
  coilEstimateRequestSchema,
  magnetEstimateRequestSchema,
} from "~/lib/estimate-requests";
import { slotFillRequestSchema } from "~/lib/slot-fill-request";
import { windingFactorRequestSchema } from "~/lib/winding-factor-request";
import { wireSizeQuerySchema } from "~/reference/wire-size-query";
import { apiOperation, jsonAnswer } from "../operation";
import {
  coilEstimateSchema,
  magnetEstimateSchema,
  magnetGradeSchema,
  slotFillSchema,
  windingFactorsSchema,
  wireSizeSchema,
} from "../schemas/engineering";

const tag = "Engineering";
const estimateCaution =
  "A first-order engineering estimate: electrical safety, insulation systems and certification follow local codes and licensed practice.";

export const engineeringPaths: ZodOpenApiPathsObject = {
  "/api/v1/coil-estimates": {
    post: apiOperation({
      operationId: "estimateCoil",
      summary: "Estimate a coil's conductor, resistance and loss",
      description: `Conductor length, mass, resistance and loss of a coil from its geometry, split into the active sides and the end turns; with a frequency the AC figures, with a thermal input the operating temperature. ${estimateCaution}`,
      tag,
      caller: "signedIn",
      body: coilEstimateRequestSchema,
      answers: { 200: jsonAnswer("The estimate.", coilEstimateSchema) },
      refusals: {
        400: "The body was refused, or the calculation refused a value (a wire size not in the tables, harmonics without a frequency): `error.fields` names each field.",
      },
    }),
  },
  "/api/v1/magnet-estimates": {
    post: apiOperation({
      operationId: "estimateMagnet",
      summary: "Estimate magnets of a grade at a temperature",
      description: `Volume, mass, Br and HcJ at temperature, air-gap flux density and the knee check of magnets of a grade (GET /api/v1/magnet-grades) or of typed properties. Heating a magnet past its grade's working temperature demagnetises it for good. ${estimateCaution}`,
      tag,
      caller: "signedIn",
      body: magnetEstimateRequestSchema,
      answers: { 200: jsonAnswer("The estimate.", magnetEstimateSchema) },
      refusals: {
        400: "The body was refused, the grade is not in the grade table, or the temperature is outside the grade's usable range: `error.fields` names each field.",
      },
    }),
  },
  "/api/v1/winding-factors": {
    post: apiOperation({
      operationId: "calculateWindingFactors",
      summary: "Winding factors of a slot and pole combination",
      description:
        "The fundamental and harmonic winding factors by the star of slots, with the coil pitch and layout used.",
      tag,
      caller: "signedIn",
      body: windingFactorRequestSchema,
      answers: {
        200: jsonAnswer("The winding factors.", windingFactorsSchema),
      },
      refusals: {
        400: "The body was refused, or the slots, poles and phases cannot make a balanced winding: `error.fields` names the field.",
      },
    }),
  },
  "/api/v1/slot-fills": {
    post: apiOperation({
      operationId: "assessSlotFill",
      summary: "Copper and gross fill of a winding in a slot",
      description:
        "The packing limits are judged on gross fill (over the enamel, liner taken off), the random-wound practice on copper fill.",
      tag,
      caller: "signedIn",
      body: slotFillRequestSchema,
      answers: { 200: jsonAnswer("The slot fill.", slotFillSchema) },
      refusals: {
        400: "The body was refused, or the wire size is not in the tables: `error.fields` names each field.",
      },
    }),
  },
  "/api/v1/wire-sizes": {
    get: apiOperation({
      operationId: "listWireSizes",
      summary: "The wire sizes of a standard",
      description:
        "Every size of AWG (thickest first) or IEC (thinnest first) with its bare diameter, area and published overall diameters.",
      tag,
      caller: "signedIn",
      query: wireSizeQuerySchema,
      answers: {
        200: jsonAnswer(
          "The sizes.",
          z.array(wireSizeSchema).meta({
            id: "WireSizeList",
            example: [
              {
                standard: "IEC",
                size: "0.500",
                gaugeNumber: null,
                series: "r20",
                bareDiameterMm: 0.5,
                areaMm2: 0.19634954084936207,
                source: "IEC 60317-0-1 nominal diameters (R 20 series)",
                publishedOverallDiametersMm: { grade1: 0.544, grade2: 0.566 },
              },
            ],
          }),
        ),
      },
    }),
  },
  "/api/v1/magnet-grades": {
    get: apiOperation({
      operationId: "listMagnetGrades",
      summary: "The magnet grade table",
      description:
        "Every grade with its properties and source, by material then name.",
      tag,
      caller: "signedIn",
      answers: {
        200: jsonAnswer("The grades.", z.array(magnetGradeSchema)),
      },
    }),
  },
};
