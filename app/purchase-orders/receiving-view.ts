/** What the /stock/receive page shows of one order (read by receiving-page.server.ts), importable by the page's components. */
import type { PurchaseOrderStatus } from "~/db/tables/purchase-order-enums";

export interface ReceivingLine {
  id: number;
  lineNumber: number;
  sku: string;
  name: string;
  unit: string;
  isWire: boolean;
  ordered: number;
  received: number;
  open: number;
  /** The most the line may still take (ordered × (1 + tolerance) − received). */
  mayStillTake: number;
  tolerancePercent: number;
  expectedDate: string;
  /** In the company currency, as a receipt today would book it; null with `costProblem` when it cannot be priced. */
  unitCost: number | null;
  costProblem: string | null;
  usualLocation: string | null;
}

export interface ReceivingOrder {
  id: number;
  number: string;
  status: PurchaseOrderStatus;
  statusLabel: string;
  receivable: boolean;
  supplier: string;
  currency: string;
  companyCurrency: string;
  lines: ReceivingLine[];
}
