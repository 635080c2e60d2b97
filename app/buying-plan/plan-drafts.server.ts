/**
 * "Make draft orders": the chosen suggestions of the plan as it stands now (worked out
 * again on the server, so what is ordered is what the plan says, not what a form claims),
 * one draft purchase order per supplier, priced from the supplier's price lines by
 * createPurchaseOrder. Each draft is written in its own transaction (createPurchaseOrder
 * opens one); a refusal stops at that supplier and says which drafts were already made.
 */
import { DomainError, isDomainError } from "~/lib/domain-error";
import { createPurchaseOrder } from "~/purchase-orders/purchase-order-writes.server";
import { purchaseOrderNumber } from "~/purchase-orders/purchase-order-status";
import { loadBuyingPlan } from "./buying-plan.server";
import { draftOrdersOf, suggestionKey } from "./plan-json";

export interface DraftMade {
  id: number;
  number: string;
  supplier: string;
  lineCount: number;
}

export interface DraftsOutcome {
  made: DraftMade[];
  /** Why the drafts stopped before the last supplier; null when all were made. */
  refused: string | null;
}

/** Makes the drafts of the suggestions `keys` (see suggestionKey) of the plan over `weeks` weeks. */
export async function makeDraftOrders(
  weeks: number,
  keys: readonly string[],
  userId: string,
): Promise<DraftsOutcome> {
  const plan = await loadBuyingPlan(weeks);
  const known = new Set(plan.suggestions.map(suggestionKey));
  const stale = keys.filter((key) => !known.has(key));
  if (stale.length > 0)
    throw new DomainError(
      409,
      `The plan has changed since it was shown (${stale.map((key) => key.replace("@", " for ")).join(", ")} no longer suggested): look at it again before ordering.`,
    );
  const { orders, unpriced } = draftOrdersOf(
    plan.suggestions,
    new Set(keys),
    plan.today,
  );
  if (unpriced.length > 0)
    throw new DomainError(
      422,
      `No supplier's price list prices ${unpriced.join(", ")}: leave ${unpriced.length === 1 ? "it" : "them"} out or order by hand.`,
    );
  const made: DraftMade[] = [];
  for (const order of orders) {
    try {
      const view = await createPurchaseOrder(
        {
          supplierId: order.supplierId,
          currency: order.currency,
          notes: `From the buying plan of ${plan.today}.`,
          lines: order.lines,
        },
        userId,
        { origin: "from the buying plan" },
      );
      made.push({
        id: view.id,
        number: purchaseOrderNumber(view.id),
        supplier: view.supplier.name,
        lineCount: view.lines.length,
      });
    } catch (error) {
      if (!isDomainError(error) || made.length === 0) throw error;
      return { made, refused: error.message };
    }
  }
  return { made, refused: null };
}
