/**
 * The price bases of a costing (as the costing API takes them), with their names on
 * the page. Its own module, without Zod, so pages that only name a basis (home,
 * insight) do not load the costing query's schema (design-page.ts).
 */
export const costBasisLabels = {
  "best-price": "Best current supplier price",
  "stock-average": "Moving average cost of stock",
} as const;
export type CostBasis = keyof typeof costBasisLabels;
