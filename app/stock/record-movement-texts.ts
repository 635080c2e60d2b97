/**
 * What the record-movement page says for each kind of movement: the help under the
 * choice of kind, the labels that change with it and the words on its one button.
 * Pure: runs in Node and in the browser.
 */
import { movementTypes, type MovementType } from "~/db/tables/stock-enums";
import { formatQuantity } from "~/lib/format";

/** The kind of movement asked for in the address; a receipt when none or no such kind. */
export function chosenMovementType(value: string | null): MovementType {
  return (movementTypes as readonly string[]).includes(value ?? "")
    ? (value as MovementType)
    : "receipt";
}

/** The address of the page for one kind of movement, keeping the item found: "?type=issue&sku=CU-050". */
export function recordMovementSearch(type: MovementType, sku: string): string {
  return `?type=${type}${sku ? `&sku=${encodeURIComponent(sku)}` : ""}`;
}

/** One line on what the kind of movement is for. */
export const movementHelp: Record<MovementType, string> = {
  receipt:
    "Stock arriving from a supplier. A wire spool: its lot number, gross and tare weight.",
  issue:
    "Stock going to a build. Weigh a spool back: type its gross weight now.",
  return: "Unused stock coming back from a build.",
  transfer: "Stock moving between locations.",
  count: "What you found in a bin; the difference is recorded.",
  scrap: "Stock that is damaged or used up.",
  adjustment: "A correction with a reason; + adds, − takes away.",
};

/** The button's word for each kind of movement. */
const movementVerbs: Record<MovementType, string> = {
  receipt: "Receive",
  issue: "Issue",
  return: "Return",
  transfer: "Transfer",
  count: "Record count",
  scrap: "Scrap",
  adjustment: "Adjust",
};

const referenceLabels: Partial<Record<MovementType, string>> = {
  issue: "Reference",
  return: "Build order",
  scrap: "Reason or reference",
};

/** The labels of the fields that are named for the kind of movement. */
export function movementFieldLabels(type: MovementType): {
  balance: string;
  quantity: string;
  reference: string;
  note: string;
} {
  return {
    balance: type === "transfer" ? "From" : "Lot and location",
    quantity: type === "adjustment" ? "Change (+ or −)" : "Quantity",
    reference: referenceLabels[type] ?? "Reference",
    note: type === "adjustment" ? "Reason" : "Note (optional)",
  };
}

/**
 * The words on the form's button: what is being recorded while it is; a weighed-back
 * issue with its amount; an issue to a build order with the order; else the kind's verb.
 */
export function recordButtonText({
  type,
  busy,
  weighBackKg,
  orderReference,
}: {
  type: MovementType;
  busy: boolean;
  /** What a weighed-back spool issues, kg; null when the spool was not weighed. */
  weighBackKg: number | null;
  /** The build order the issue goes to, if one is chosen. */
  orderReference?: string;
}): string {
  if (busy) return "Recording…";
  if (weighBackKg !== null && weighBackKg > 0)
    return `Issue ${formatQuantity(weighBackKg, "kg", 3)}${orderReference ? ` to ${orderReference}` : ""}`;
  if (orderReference) return `Issue to ${orderReference}`;
  return movementVerbs[type];
}
