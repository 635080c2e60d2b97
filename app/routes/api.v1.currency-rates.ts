import type { Route } from "./+types/api.v1.currency-rates";
import { requireCapability, requireUser } from "~/auth/guard.server";
import { apiError, methodNotAllowed, readJsonBody } from "~/lib/api.server";
import { companyCurrencyRateRefusal } from "~/purchasing/currency-rate-rules";
import { currencyRateSchema } from "~/purchasing/supplier-schemas";
import {
  companyCurrency,
  listCurrencyRates,
  setCurrencyRate,
} from "~/purchasing/suppliers.server";

async function ratesAnswer(): Promise<Response> {
  const [currency, rates] = await Promise.all([
    companyCurrency(),
    listCurrencyRates(),
  ]);
  return Response.json({ companyCurrency: currency, rates });
}

/** GET /api/v1/currency-rates → { companyCurrency, rates: [{ currency, rate, validFrom }] }, newest first. */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  return ratesAnswer();
}

/**
 * PUT /api/v1/currency-rates (buyer, admin) { currency, rate, validFrom } → 200 the list.
 * `rate` is units of the company currency per one unit of `currency`; the same currency
 * and day again replaces the rate. A rate for the company currency itself is refused.
 */
export async function action({ request }: Route.ActionArgs) {
  const user = await requireCapability(request, "keepPrices");
  if (request.method !== "PUT") return methodNotAllowed(["GET", "PUT"]);
  const input = await readJsonBody(request, currencyRateSchema);
  const refusal = companyCurrencyRateRefusal(
    input.currency,
    await companyCurrency(),
  );
  if (refusal) return apiError(400, refusal, { currency: [refusal] });
  await setCurrencyRate(input, user.id);
  return ratesAnswer();
}
