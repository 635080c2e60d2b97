/** Signing in and out, who is signed in, the outbox, and the contract itself. */
import { z } from "zod";
import type { ZodOpenApiPathsObject } from "zod-openapi";
import { sessionCredentialsSchema } from "~/lib/account-schemas";
import { roles } from "~/lib/roles";
import { outboxQuerySchema } from "~/mail/outbox-query";
import { apiOperation, errorBodySchema, jsonAnswer } from "../operation";

const tag = "Account";

const openApiDocumentSchema = z
  .looseObject({
    openapi: z.string().regex(/^3\.1\.\d+$/),
    info: z.looseObject({ title: z.string(), version: z.string() }),
    paths: z.record(z.string(), z.unknown()),
  })
  .meta({ description: "An OpenAPI 3.1 document." });

export const signedInPersonSchema = z
  .object({
    user: z.object({
      email: z.string(),
      name: z.string(),
      roles: z.array(z.enum(roles)).meta({
        description: "The person's roles; an admin may do everything.",
      }),
    }),
  })
  .meta({
    id: "SignedInPerson",
    description: "Who is signed in, with their roles.",
    example: {
      user: {
        email: "storekeeper@turnledger.test",
        name: "Piet Varga",
        roles: ["storekeeper"],
      },
    },
  });

export const outboxMessageSchema = z
  .object({
    to: z.string(),
    subject: z.string(),
    text: z.string().meta({
      description:
        "The plain-text body; a one-time link (invitation, password reset) is never shown, a note stands in its place.",
    }),
    sentAt: z.iso.datetime().nullable().meta({
      description: "When it was sent (ISO 8601, UTC); null while unsent.",
    }),
    attachments: z.array(
      z.object({
        fileName: z.string(),
        contentType: z.string(),
        byteSize: z.number().int(),
      }),
    ),
  })
  .meta({
    id: "OutboxMessage",
    description:
      "An e-mail the app wrote, with its attachments' names and sizes (never their bytes).",
    example: {
      to: "buyer@turnledger.test",
      subject: "Low stock: MG-N42SH-B20105",
      text: "NdFeB block N42SH 20 × 10 × 5 mm is down to 380 pcs available (reorder point 400 pcs).",
      sentAt: "2026-11-28T07:45:12.000Z",
      attachments: [],
    },
  });

const retryAfter = z.object({
  "Retry-After": z
    .string()
    .regex(/^\d+$/)
    .meta({ description: "Seconds to wait before trying again." }),
});

const crossSite =
  "Sent with the session cookie from another site (its `Origin` is not Turnledger's own), or without `Origin` or `Referer`.";

export const accountPaths: ZodOpenApiPathsObject = {
  "/api/v1/openapi.json": {
    get: apiOperation({
      operationId: "getContract",
      summary: "This document",
      description:
        "The contract of /api/v1 as OpenAPI 3.1, made from the schemas the routes validate with.",
      tag,
      caller: "signedIn",
      answers: {
        200: jsonAnswer("The OpenAPI document.", openApiDocumentSchema),
      },
    }),
  },
  "/api/v1/sessions": {
    post: apiOperation({
      operationId: "signIn",
      summary: "Sign in with e-mail and password",
      description:
        "Starts a session and sets its cookie. For scripts a personal API token (account page) is simpler: it needs no cookie and no `Origin`. Repeated wrong passwords pause sign-in to the account or from the address for some minutes.",
      tag,
      caller: "anyone",
      body: sessionCredentialsSchema,
      answers: {
        200: {
          description: "Signed in: the person, and the session cookie.",
          headers: z.object({
            "Set-Cookie": z.string().meta({
              description:
                "The session cookie `turnledger_session` (HttpOnly, SameSite=Lax, Secure when the app is served over HTTPS), to send with later requests.",
              example: "turnledger_session=…; Path=/; HttpOnly; SameSite=Lax",
            }),
          }),
          content: { "application/json": { schema: signedInPersonSchema } },
        },
        429: {
          description:
            "Too many wrong passwords for this account or from this address: sign-in is paused. Nothing was checked.",
          headers: retryAfter,
          content: { "application/json": { schema: errorBodySchema } },
        },
      },
      refusals: {
        401: "The e-mail or the password is wrong (which one is not said).",
        403: crossSite,
        503: "The server is busy checking other passwords, or the database cannot be reached. Retry after the seconds in `Retry-After`.",
      },
    }),
    delete: apiOperation({
      operationId: "signOut",
      summary: "Sign out",
      description:
        "Ends the session of the cookie sent, if any, and clears the cookie. Answers 204 also when no one was signed in.",
      tag,
      caller: "anyone",
      answers: {
        204: {
          description: "Signed out; the cookie is cleared.",
          headers: z.object({
            "Set-Cookie": z.string().meta({
              description: "Clears `turnledger_session`.",
            }),
          }),
        },
      },
      refusals: { 403: crossSite },
    }),
  },
  "/api/v1/me": {
    get: apiOperation({
      operationId: "getSignedInPerson",
      summary: "Who is signed in",
      tag,
      caller: "signedIn",
      answers: {
        200: jsonAnswer("The signed-in person.", signedInPersonSchema),
      },
    }),
  },
  "/api/v1/outbox": {
    get: apiOperation({
      operationId: "listOutboxMessages",
      summary: "The newest e-mails the app wrote",
      description:
        "Newest first, sent or not: for checking what the app tells people (and for tests).",
      tag,
      caller: "readOutbox",
      query: outboxQuerySchema,
      answers: {
        200: jsonAnswer("The messages.", z.array(outboxMessageSchema)),
      },
    }),
  },
};
