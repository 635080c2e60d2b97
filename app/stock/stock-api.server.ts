import {
  isDatabaseUnavailable,
  isDuplicateKey,
  unavailableReason,
} from "~/db/database-errors";
import { isEngineeringInputError } from "~/engineering/errors";
import { apiError, databaseUnavailableAnswer } from "~/lib/api.server";
import { areaLogger } from "~/observability/logger.server";
import { isStockError } from "./stock-errors";

const dbLog = areaLogger("db");

/**
 * Runs stock work for an API route; the ledger's refusals become 400/404/409 JSON answers,
 * and a database lost on the way (its transaction rolled back) a 503 JSON answer.
 */
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
    if (isDatabaseUnavailable(error)) {
      dbLog.warn(
        { reason: unavailableReason(error) },
        "database unavailable during a request",
      );
      return databaseUnavailableAnswer();
    }
    throw error;
  }
}
