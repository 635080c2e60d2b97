/** The fixed lists of the storeroom tables, importable by browser code. */
export const lotHoldActions = ["hold", "release"] as const;
/** counting → approved, or cancelled; a stocktake under review is still "counting" until approved. */
export const stocktakeStatuses = ["counting", "approved", "cancelled"] as const;

export type LotHoldAction = (typeof lotHoldActions)[number];
export type StocktakeStatus = (typeof stocktakeStatuses)[number];
