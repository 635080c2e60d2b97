/** The fixed lists of the stock tables, importable by browser code. */
export const itemKinds = ["wire", "magnet", "part"] as const;
export const stockUnits = ["kg", "pcs", "m"] as const;
export const magnetShapes = ["block", "arc", "disc", "ring"] as const;
export const movementTypes = [
  "receipt",
  "issue",
  "return",
  "transfer",
  "adjustment",
  "count",
  "scrap",
] as const;

export type ItemKind = (typeof itemKinds)[number];
export type StockUnit = (typeof stockUnits)[number];
export type MovementType = (typeof movementTypes)[number];
