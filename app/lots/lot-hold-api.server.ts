/**
 * What the two hold API routes share: POST /api/v1/lots/:lot/hold { reason } and
 * POST /api/v1/lots/:lot/release { reason? }, where :lot is the lot's number and `?sku=`
 * names the item when two items have a lot of that number.
 */
import {
  readJsonBody,
  readOptionalJsonBody,
  readSearchParams,
} from "~/lib/api.server";
import { answerDomainError } from "~/lib/api-errors.server";
import {
  holdLotSchema,
  lotQuerySchema,
  releaseLotSchema,
} from "./lot-hold-requests";
import { lotByNumber } from "./lot-details.server";
import { holdLot, releaseLot } from "./lot-holds.server";

/** Runs a hold or a release: 200 with the lot, 400 for a bad body, 404 no such lot, 409 ambiguous or in the wrong state. */
export function answerLotHoldStep(
  request: Request,
  lotNumber: string,
  step: "hold" | "release",
  userId: string,
): Promise<Response> {
  return answerDomainError(async () => {
    const { sku } = readSearchParams(request, lotQuerySchema);
    if (step === "hold") {
      const { reason } = await readJsonBody(request, holdLotSchema);
      const { id: lotId } = await lotByNumber(lotNumber, sku ?? null);
      return Response.json(await holdLot(lotId, reason, userId));
    }
    const { reason } = await readOptionalJsonBody(request, releaseLotSchema);
    const { id: lotId } = await lotByNumber(lotNumber, sku ?? null);
    return Response.json(await releaseLot(lotId, reason, userId));
  });
}
