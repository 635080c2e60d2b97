/**
 * The life of a build order: draft → reserved → in progress → complete, or cancelled
 * from any state before complete. Pure: shared by the server and the pages.
 */
import type { buildOrderStatuses } from "~/db/tables/build-order-enums";

export type BuildOrderStatus = (typeof buildOrderStatuses)[number];

export const buildOrderStatusLabels: Record<BuildOrderStatus, string> = {
  draft: "Draft",
  reserved: "Stock held",
  in_progress: "Being built",
  complete: "Built",
  cancelled: "Cancelled",
};

/** The order reference people write on labels and movements: "BO-12". */
export function buildOrderReference(id: number): string {
  return `BO-${id}`;
}

/**
 * "BO" or "build order" as a word, an optional "no."/"nr"/"number", one optional
 * separator (any dash, the minus sign, _ # / . :) and the order's number (leading zeros
 * allowed; an INT id has at most ten digits).
 */
const buildOrderInText =
  /(?<![\p{L}\p{N}])(?:BO|build[\s-]*order)(?!\p{L})\s*(?:(?:no|nr|number)\.?\s*)?[\p{Pd}\u2212_#/.:]?\s*(?:(?:no|nr|number)\.?\s*)?0*(\d{1,10})(?!\p{N})/iu;

/** Characters a paste may hide inside a word: zero-width spaces and joiners, the byte-order mark. */
const invisible = /[\u200b-\u200d\u2060\ufeff]/gu;

/**
 * The build order a free-text reference names, or null: "BO-12", "bo 12", "BO12", "BO no. 12",
 * "build order #12" and a reference that holds one ("for BO-12") all name order 12, whatever
 * dash or minus sign separates them and in full-width letters too (read as NFKC). A reference
 * like this on a plain issue would lower the stock but not what the order holds, so the ledger
 * refuses it.
 */
export function buildOrderIdInReference(
  reference: string | null | undefined,
): number | null {
  const text = (reference ?? "").normalize("NFKC").replace(invisible, "");
  const match = buildOrderInText.exec(text);
  if (!match) return null;
  const id = Number(match[1]);
  return id >= 1 ? id : null;
}

/** Stock can be (further) reserved until the build is complete or cancelled. */
export function canReserve(status: BuildOrderStatus): boolean {
  return (
    status === "draft" || status === "reserved" || status === "in_progress"
  );
}

/** Reserved stock is issued once something is held, until the build is closed. */
export function canIssue(status: BuildOrderStatus): boolean {
  return status === "reserved" || status === "in_progress";
}

export function canCancel(status: BuildOrderStatus): boolean {
  return (
    status === "draft" || status === "reserved" || status === "in_progress"
  );
}

/** A build is completed once stock has been issued to it. */
export function canComplete(status: BuildOrderStatus): boolean {
  return status === "in_progress";
}

/** The quantity of motors can change until the first issue; it releases what is held. */
export function canChangeQuantity(status: BuildOrderStatus): boolean {
  return status === "draft" || status === "reserved";
}

/** The planned start can change while the order is open (not built, not cancelled). */
export function canChangePlannedStart(status: BuildOrderStatus): boolean {
  return canCancel(status);
}

/** Why a step is refused in the order's current state, for a 409 answer. */
export function refusalFor(
  step:
    "reserve" | "issue" | "cancel" | "complete" | "quantity" | "plannedStart",
  status: BuildOrderStatus,
): string {
  const state = buildOrderStatusLabels[status].toLowerCase();
  switch (step) {
    case "reserve":
      return `The build order is ${state}: nothing more can be reserved.`;
    case "issue":
      return status === "draft"
        ? "Reserve stock for the build order before issuing to it."
        : `The build order is ${state}: nothing more can be issued.`;
    case "cancel":
      return `The build order is ${state} and can no longer be cancelled.`;
    case "complete":
      return status === "draft" || status === "reserved"
        ? "Nothing has been issued to the build order yet: issue stock before completing it."
        : `The build order is already ${state}.`;
    case "quantity":
      return status === "in_progress"
        ? "Stock has been issued to the build order: the number of motors can no longer change."
        : `The build order is ${state}: the number of motors can no longer change.`;
    case "plannedStart":
      return `The build order is ${state}: its planned start can no longer change.`;
  }
}
