/**
 * The price bases of a costing (as the costing API takes them), with their names on
 * the page, and the query string a design page keeps for its costing. Its own module,
 * without Zod, so pages that only name a basis (home, insight) or link with the query
 * (the design pages) do not load the costing query's schema (design-page.ts).
 */
export const costBasisLabels = {
  "best-price": "Best current supplier price",
  "stock-average": "Moving average cost of stock",
} as const;
export type CostBasis = keyof typeof costBasisLabels;

/** The query string a design page keeps for its costing ("" for the defaults). */
export function costQuerySearch(query: {
  quantity: number;
  basis: CostBasis;
}): string {
  const params = new URLSearchParams();
  if (query.quantity !== 1) params.set("quantity", String(query.quantity));
  if (query.basis !== "best-price") params.set("basis", query.basis);
  const text = params.toString();
  return text ? `?${text}` : "";
}
