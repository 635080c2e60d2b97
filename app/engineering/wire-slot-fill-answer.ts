/**
 * The body of POST /api/v1/slot-fills: a wire slot fill (~/engineering/wire-slot-fill) as
 * the API answers it, the most serious limit passed named by its code (decision 037).
 * Pure, so the contract's example is made by the same function as the route's answer.
 */
import type { WireSlotFill } from "./wire-slot-fill";

export function slotFillAnswer(fill: WireSlotFill) {
  return {
    copperFill: fill.copperFill,
    grossFill: fill.grossFill,
    limit: fill.limit,
    fits: fill.fits,
    message: fill.message,
    judgedOn: fill.judgedOn,
    limitPassed: fill.limitPassed,
    limitCode: fill.warning?.code ?? null,
    note: fill.note,
    wireAreaMm2: fill.wireAreaMm2,
    insulation: fill.insulation,
    insulationAssumed: fill.insulationAssumed,
    bareDiameterMm: fill.bareDiameterMm,
    overallDiameterMm: fill.overallDiameterMm,
    overallDiameterIsEstimate: fill.overallDiameterIsEstimate,
    overallDiameterSource: fill.overallDiameterSource,
  };
}
