import {
  isDatabaseUnavailable,
  isDuplicateKey,
  unavailableReason,
} from "~/db/database-errors";
import { isEngineeringInputError } from "~/engineering/errors";
import { apiError, databaseUnavailableAnswer } from "~/lib/api.server";
import { areaLogger } from "~/observability/logger.server";
import { isDomainError } from "./domain-error";

const dbLog = areaLogger("db");

/**
 * Runs an API route's work; domain refusals (`DomainError`, engineering input errors,
 * duplicates) become 400/404/409 JSON answers, and a database lost on the way (its
 * transaction rolled back) a 503 JSON answer. The one API error mapper.
 */
export async function answerDomainError(
  work: () => Promise<Response>,
): Promise<Response> {
  try {
    return await work();
  } catch (error) {
    if (isDomainError(error)) {
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
