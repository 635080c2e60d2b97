import { isDuplicateKey } from "~/db/database-errors";
import { isEngineeringInputError } from "~/engineering/errors";
import { apiError } from "~/lib/api.server";
import { isStockError } from "./stock-errors";

/** Runs stock work for an API route; the ledger's refusals become 400/404/409 JSON answers. */
export async function answerStockError(
  work: () => Promise<Response>,
): Promise<Response> {
  try {
    return await work();
  } catch (error) {
    if (isStockError(error)) {
      return apiError(
        error.status,
        error.message,
        error.field ? { [error.field]: [error.message] } : undefined,
      );
    }
    if (isEngineeringInputError(error)) {
      return apiError(400, error.message, { [error.field]: [error.message] });
    }
    if (isDuplicateKey(error)) return apiError(409, "That already exists.");
    throw error;
  }
}
