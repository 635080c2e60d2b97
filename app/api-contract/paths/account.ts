/** Signing in and out, who is signed in, the outbox, and the contract itself. */
import { z } from "zod";
import type { ZodOpenApiPathsObject } from "zod-openapi";
import { apiOperation, jsonAnswer } from "../operation";

const openApiDocumentSchema = z
  .looseObject({
    openapi: z.string().regex(/^3\.1\.\d+$/),
    info: z.looseObject({ title: z.string(), version: z.string() }),
    paths: z.record(z.string(), z.unknown()),
  })
  .meta({ description: "An OpenAPI 3.1 document." });

export const accountPaths: ZodOpenApiPathsObject = {
  "/api/v1/openapi.json": {
    get: apiOperation({
      operationId: "getContract",
      summary: "This document",
      description:
        "The contract of /api/v1 as OpenAPI 3.1, made from the schemas the routes validate with.",
      tag: "Account",
      caller: "signedIn",
      answers: {
        200: jsonAnswer("The OpenAPI document.", openApiDocumentSchema),
      },
    }),
  },
};
