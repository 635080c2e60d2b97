/**
 * The record-movement form: its text fields turned into the ledger's request
 * (the same schema as POST /api/v1/stock-movements), so the page and the API
 * accept and refuse exactly the same things. A decimal comma is accepted.
 */
import { z } from "zod";
import { formNumber } from "~/lib/number-text";
import { movementRequestSchema } from "./movement-request";

const numberFields = [
  "quantity",
  "unitCost",
  "grossKg",
  "tareKg",
  "buildOrderId",
  "supplierId",
] as const;

function formValuesToRequest(values: unknown): unknown {
  if (!values || typeof values !== "object") return values;
  const request: Record<string, unknown> = {
    ...(values as Record<string, unknown>),
  };
  for (const field of numberFields) request[field] = formNumber(request[field]);
  // A chosen balance row arrives as "lot|location"; an empty lot means the item is not kept in lots.
  if (typeof request.balance === "string" && request.balance.includes("|")) {
    const [lot, location] = request.balance.split("|");
    request.lot = lot || undefined;
    request.location = location;
  }
  delete request.balance;
  for (const [key, value] of Object.entries(request))
    if (value === "") request[key] = undefined;
  return request;
}

export const movementFormSchema = z.preprocess(
  formValuesToRequest,
  movementRequestSchema,
);

/**
 * Where a refusal's field shows on the form (lot and location are one choice there). An
 * issue to a build order shows the order's refusals (not open, no line for the item, no
 * such order) at the order's choice; a weighed-back issue shows a refused amount at the
 * gross weight.
 */
export function formFieldOf(
  field: string | undefined,
  type: string,
  toBuildOrder = false,
  /** The spool was weighed back: the issue form shows no quantity, so an amount refused shows at the weight. */
  weighed = false,
): string {
  if ((field === "lot" || field === "location") && type !== "receipt")
    return "balance";
  if (field === "quantity" && weighed && type === "issue") return "grossKg";
  if (toBuildOrder && (field === undefined || field === "sku"))
    return "buildOrderId";
  return field ?? "";
}
