/** What the database starts a supplier with, without Zod (the new-supplier form's first values, decision 051). Pure. */

/** What the database starts a supplier with (common practice, no source): wire ±10 % by weight, pieces exact. */
export const supplierOrderingDefaults = {
  metalBaseFixedAt: "order",
  wireTolerancePercent: 10,
  pieceTolerancePercent: 0,
} as const;
