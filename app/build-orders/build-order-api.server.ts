/** What the build-order API routes share: refusals as JSON, the order id from the path. */
import { apiError } from "~/lib/api.server";
import { answerDomainError } from "~/lib/api-errors.server";
import { isBuildOrderError } from "./build-order-errors";
import { buildOrderIdFromPath } from "./build-order-path";

/**
 * Runs build-order work for an API route: a BuildOrderError becomes 400/404/409 JSON
 * (`{ error: { message, fields?, shortages? } }`), and the ledger's refusals the same.
 */
export async function answerBuildOrderError(
  work: () => Promise<Response>,
): Promise<Response> {
  return answerDomainError(async () => {
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
  return buildOrderIdFromPath(value, (message) => apiError(404, message));
}

/** Kept here for the build-order routes; it lives with the other body readers. */
export { readOptionalJsonBody } from "~/lib/api.server";
