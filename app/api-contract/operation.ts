/**
 * One way to describe an operation of /api/v1 in the published contract (the OpenAPI
 * document, docs/decisions/046): who may call it, what it reads from the address and
 * the body (the very Zod schemas the route validates with), and every status it can
 * answer with its body. The answers every guarded route shares (401, 403, 400 for a
 * bad query or body, 503 while the database is away) are added here, so each
 * operation names only its own. Pure: Zod and zod-openapi only.
 */
import { z } from "zod";
import type {
  ZodOpenApiOperationObject,
  ZodOpenApiResponseObject,
} from "zod-openapi";
import { rolesWith, type Capability } from "~/lib/capabilities";
import { roles, type Role } from "~/lib/roles";

/** The one error shape of the API (app/lib/api.server.ts apiError). */
export const errorBodySchema = z
  .object({
    error: z.object({
      message: z.string().meta({
        description: "What went wrong, as a sentence a person can act on.",
      }),
      fields: z.record(z.string(), z.array(z.string())).optional().meta({
        description:
          "For a refused body or query: each field (a dotted path into the body) with its messages.",
      }),
    }),
  })
  .meta({
    id: "ErrorBody",
    description: "Every refusal and error of /api/v1 has this shape.",
    example: {
      error: {
        message: "Some fields are missing or wrong.",
        fields: { quantity: ["The quantity must be more than 0."] },
      },
    },
  });

/** Who may call an operation: nobody signed in, any signed-in person, or the roles with a capability. */
export type Caller = "anyone" | "signedIn" | Capability;

/** The roles that may call: every role, or the capability's roles and admins. */
export function rolesAllowed(caller: Caller): Role[] {
  if (caller === "anyone" || caller === "signedIn") return [...roles];
  const allowed = rolesWith(caller);
  return roles.filter((role) => role === "admin" || allowed.includes(role));
}

/** The two ways to authenticate (components.securitySchemes). */
export const signedInSecurity: Record<string, string[]>[] = [
  { sessionCookie: [] },
  { bearerToken: [] },
];

const retryAfter = {
  "Retry-After": {
    description: "Seconds to wait before trying again.",
    schema: { type: "integer" as const, minimum: 1 },
  },
};

function errorAnswer(
  status: string,
  description: string,
): ZodOpenApiResponseObject {
  return {
    description,
    ...(status === "503" || status === "429" ? { headers: retryAfter } : {}),
    content: { "application/json": { schema: errorBodySchema } },
  };
}

/** Descriptions of the statuses the operations share. */
export const sharedErrors = {
  400: "The query or body was refused: `error.fields` names each field.",
  401: "Not signed in: send the session cookie or a bearer token.",
  403: "Signed in, but without a role this operation needs.",
  404: "Nothing by that name or number.",
  405: "This method is not served here (the `Allow` header lists those that are).",
  409: "The request conflicts with the current state; nothing was changed.",
  413: "The body is larger than this operation takes.",
  422: "The request was read but cannot be carried out as it stands; nothing was changed.",
  429: "Too many attempts: wait the seconds in `Retry-After`.",
  503: "The database cannot be reached; nothing was changed. Retry after the seconds in `Retry-After`.",
} as const;

type ErrorStatus = keyof typeof sharedErrors;

export interface OperationSpec {
  operationId: string;
  summary: string;
  description?: string;
  tag: string;
  caller: Caller;
  /** The Zod object the route reads its query string with. */
  query?: z.ZodType;
  /** The path parameters, as a Zod object. */
  path?: z.ZodType;
  /** The JSON body's schema. */
  body?: z.ZodType;
  /** Set when the body may be left out. */
  bodyOptional?: boolean;
  /** The success answers, by status. */
  answers: Record<string, ZodOpenApiResponseObject>;
  /** Refusals this operation gives besides the shared ones, with its own words where they help. */
  refusals?: Partial<Record<ErrorStatus, string>>;
  /** Extra keys of the operation object (headers, other content types). */
  extra?: Partial<ZodOpenApiOperationObject>;
}

/** A JSON array answer with the number of matching rows in its X-Total-Count header. */
export function countedAnswer(
  description: string,
  schema: z.ZodType,
): ZodOpenApiResponseObject {
  return {
    ...jsonAnswer(description, schema),
    headers: {
      "X-Total-Count": {
        description: "Rows matching, on every page.",
        schema: { type: "integer", minimum: 0 },
      },
    },
  };
}

/** A success answer with a JSON body. */
export function jsonAnswer(
  description: string,
  schema: z.ZodType,
): ZodOpenApiResponseObject {
  return { description, content: { "application/json": { schema } } };
}

function whoText(caller: Caller, allowed: Role[]): string {
  if (caller === "anyone") return "Anyone, signed in or not.";
  if (caller === "signedIn") return "Any signed-in person.";
  return `Roles: ${allowed.join(", ")}.`;
}

/** The operation object of the document for one method of one path. */
export function apiOperation(spec: OperationSpec): ZodOpenApiOperationObject {
  const allowed = rolesAllowed(spec.caller);
  const errors: Partial<Record<ErrorStatus, string>> = {
    503: sharedErrors[503],
  };
  if (spec.caller !== "anyone") errors[401] = sharedErrors[401];
  if (spec.caller !== "anyone" && spec.caller !== "signedIn")
    errors[403] = sharedErrors[403];
  if (spec.query || spec.body || spec.path) errors[400] = sharedErrors[400];
  if (spec.body) errors[413] = sharedErrors[413];
  Object.assign(errors, spec.refusals);
  const responses: Record<string, ZodOpenApiResponseObject> = {
    ...spec.answers,
  };
  for (const [status, description] of Object.entries(errors))
    responses[status] = errorAnswer(status, description);

  const requestParams: ZodOpenApiOperationObject["requestParams"] = {};
  if (spec.query) requestParams.query = spec.query as never;
  if (spec.path) requestParams.path = spec.path as never;

  return {
    operationId: spec.operationId,
    summary: spec.summary,
    description: [
      spec.description,
      `**Who may call:** ${whoText(spec.caller, allowed)}`,
    ]
      .filter(Boolean)
      .join("\n\n"),
    tags: [spec.tag],
    security: spec.caller === "anyone" ? [] : signedInSecurity,
    "x-roles": spec.caller === "anyone" ? [] : allowed,
    ...(spec.query || spec.path ? { requestParams } : {}),
    ...(spec.body
      ? {
          requestBody: {
            required: !spec.bodyOptional,
            content: { "application/json": { schema: spec.body } },
          },
        }
      : {}),
    responses,
    ...spec.extra,
  };
}
