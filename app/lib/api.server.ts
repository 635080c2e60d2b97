/** Helpers shared by the JSON API routes under /api/v1: one error shape everywhere. */
import type { z } from "zod";
import { searchParamsObject } from "./search-params";
import { databaseUnavailableMessage } from "~/db/database-errors";
import { isEngineeringInputError } from "~/engineering/errors";

export function apiError(
  status: number,
  message: string,
  fields?: Record<string, string[]>,
  headers?: HeadersInit,
): Response {
  return Response.json(
    { error: fields ? { message, fields } : { message } },
    { status, headers },
  );
}

/** 503 "database unavailable" with Retry-After, for an API request made while the database is down. */
export function databaseUnavailableAnswer(): Response {
  return apiError(503, databaseUnavailableMessage, undefined, {
    "Retry-After": "5",
  });
}

const notJson = () =>
  apiError(400, "The body must be JSON (Content-Type: application/json).");

/** A parsed body checked against its schema; throws a 400 answer naming each bad field. */
function validBody<Schema extends z.ZodType>(
  body: unknown,
  schema: Schema,
): z.output<Schema> {
  const parsed = schema.safeParse(body);
  if (parsed.success) return parsed.data;
  throw apiError(
    400,
    "Some fields are missing or wrong.",
    fieldsOf(parsed.error.issues, "body"),
  );
}

/** Reads and validates a JSON body; throws a 400 answer naming each bad field. */
export async function readJsonBody<Schema extends z.ZodType>(
  request: Request,
  schema: Schema,
): Promise<z.infer<Schema>> {
  let body: unknown;
  try {
    body = await request.json();
  } catch {
    throw notJson();
  }
  return validBody(body, schema);
}

/** Reads an optional JSON body (none, or an empty one, reads as {}) and validates it; throws a 400 naming each bad field. */
export async function readOptionalJsonBody<Schema extends z.ZodType>(
  request: Request,
  schema: Schema,
): Promise<z.output<Schema>> {
  const text = await request.text();
  let body: unknown = {};
  if (text.trim() !== "") {
    try {
      body = JSON.parse(text);
    } catch {
      throw notJson();
    }
  }
  return validBody(body, schema);
}

/** Reads and validates a request's query string (empty values dropped); throws a 400 naming each bad parameter. */
export function readSearchParams<Schema extends z.ZodType>(
  request: Request,
  schema: Schema,
): z.infer<Schema> {
  const parsed = schema.safeParse(
    searchParamsObject(new URL(request.url).searchParams),
  );
  if (parsed.success) return parsed.data;
  throw apiError(
    400,
    "Some query parameters are wrong.",
    fieldsOf(parsed.error.issues, "query"),
  );
}

/** Zod issues as the API's `fields`: messages by dotted path. */
function fieldsOf(
  issues: readonly z.core.$ZodIssue[],
  whole: string,
): Record<string, string[]> {
  const fields: Record<string, string[]> = {};
  for (const issue of issues) {
    const key = issue.path.join(".") || whole;
    (fields[key] ??= []).push(issue.message);
  }
  return fields;
}

export function methodNotAllowed(allowed: string[]): Response {
  return apiError(405, `Use ${allowed.join(" or ")} here.`, undefined, {
    Allow: allowed.join(", "),
  });
}

/** Runs a calculation; a refusal by the engineering modules becomes a 400 naming the field. */
export function calculateOr400<T>(calculate: () => T): T {
  try {
    return calculate();
  } catch (error) {
    if (isEngineeringInputError(error)) {
      throw apiError(400, error.message, { [error.field]: [error.message] });
    }
    throw error;
  }
}
