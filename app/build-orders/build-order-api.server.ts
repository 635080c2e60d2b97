/** What the build-order API routes share: refusals as JSON, the list query, the order id from the path. */
import { z } from "zod";
import { buildOrderStatuses } from "~/db/tables/build-orders";
import { apiError } from "~/lib/api.server";
import { answerStockError } from "~/stock/stock-api.server";
import { isBuildOrderError } from "./build-order-errors";

/**
 * Runs build-order work for an API route: a BuildOrderError becomes 400/404/409 JSON
 * (`{ error: { message, fields?, shortages? } }`), and the ledger's refusals the same.
 */
export async function answerBuildOrderError(
  work: () => Promise<Response>,
): Promise<Response> {
  return answerStockError(async () => {
    try {
      return await work();
    } catch (error) {
      if (!isBuildOrderError(error)) throw error;
      return Response.json(
        {
          error: {
            message: error.message,
            ...(error.field
              ? { fields: { [error.field]: [error.message] } }
              : {}),
            ...(error.shortages ? { shortages: error.shortages } : {}),
          },
        },
        { status: error.status },
      );
    }
  });
}

/** The order id of the path, or a 404 answer when it is not a whole number. */
export function orderIdFrom(value: string | undefined): number {
  const id = Number(value);
  if (!/^\d{1,9}$/.test(value ?? "") || !Number.isSafeInteger(id) || id < 1)
    throw apiError(404, `No build order "${value ?? ""}".`);
  return id;
}

export const buildOrderListQuerySchema = z.object({
  status: z
    .enum(buildOrderStatuses, {
      error: `status must be one of ${buildOrderStatuses.join(", ")}.`,
    })
    .optional(),
  page: z.coerce
    .number({ error: "page must be a number." })
    .int("page must be a whole number.")
    .min(1, "page starts at 1.")
    .default(1),
  pageSize: z.coerce
    .number({ error: "pageSize must be a number." })
    .int("pageSize must be a whole number.")
    .min(1, "pageSize must be 1 to 200.")
    .max(200, "pageSize must be 1 to 200.")
    .default(50),
});

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
      throw apiError(
        400,
        "The body must be JSON (Content-Type: application/json).",
      );
    }
  }
  const parsed = schema.safeParse(body);
  if (parsed.success) return parsed.data;
  const fields: Record<string, string[]> = {};
  for (const issue of parsed.error.issues)
    (fields[issue.path.join(".") || "body"] ??= []).push(issue.message);
  throw apiError(400, "Some fields are missing or wrong.", fields);
}
