/**
 * What the order page works out from the order before it shows it: where stock is, what
 * has been issued, the held stock a storekeeper issues from, the step to offer first and
 * the spool weigh-back preview. Pure: runs in the browser and in tests.
 */
import { typedNumber } from "~/lib/number-text";
import { weighBackPreview as spoolWeighBack } from "~/stock/weigh-back-preview";
import {
  canComplete,
  canIssue,
  canReserve,
  type BuildOrderStatus,
} from "./build-order-status";

/** A lot at a location as the page names it: "lot SP-7 · Rack A", or the location alone. */
export function stockPlaceText(row: {
  lot: string | null;
  location: string;
}): string {
  return row.lot ? `lot ${row.lot} · ${row.location}` : row.location;
}

/** Every issue of the order's lines with its item, newest first. */
export function issuesNewestFirst<Issue extends { at: string }>(
  lines: readonly { sku: string; unit: string; issues: readonly Issue[] }[],
): (Issue & { sku: string; unit: string })[] {
  return lines
    .flatMap((line) =>
      line.issues.map((issue) => ({
        ...issue,
        sku: line.sku,
        unit: line.unit,
      })),
    )
    .sort((a, b) => (a.at < b.at ? 1 : a.at > b.at ? -1 : 0));
}

interface HeldRow {
  lot: string | null;
  location: string;
  quantity: number;
  onHand: number;
  tareKg: number | null;
}

/** One lot at one location held for the order: what the storekeeper issues from. */
export interface HeldSpot extends HeldRow {
  /** "sku|lot|location", the value the issue form sends. */
  key: string;
  sku: string;
  name: string;
  unit: string;
  kind: string;
}

/** The held stock of every line, in the lines' order and each line's oldest lot first. */
export function heldSpots(
  lines: readonly {
    sku: string;
    name: string;
    unit: string;
    kind: string;
    held: readonly HeldRow[];
  }[],
): HeldSpot[] {
  return lines.flatMap((line) =>
    line.held.map((held) => ({
      key: `${line.sku}|${held.lot ?? ""}|${held.location}`,
      sku: line.sku,
      name: line.name,
      unit: line.unit,
      kind: line.kind,
      lot: held.lot,
      location: held.location,
      quantity: held.quantity,
      onHand: held.onHand,
      tareKg: held.tareKg,
    })),
  );
}

/** Changes whenever what is held changes, so the issue form starts afresh. */
export function heldSpotsKey(spots: readonly HeldSpot[]): string {
  return spots.map((spot) => `${spot.key}:${spot.quantity}`).join(",");
}

export type PrimaryStep = "reserve" | "issue" | "complete" | null;

/** The step the page offers as the main button for this person, if any. */
export function primaryStepOf(
  order: {
    status: BuildOrderStatus;
    lines: readonly { toReserve: number; held: readonly unknown[] }[];
  },
  can: { build: boolean; issue: boolean },
): PrimaryStep {
  const needsReserve = order.lines.some((line) => line.toReserve > 0);
  const holds = order.lines.some((line) => line.held.length > 0);
  if (can.build && order.status === "draft") return "reserve";
  if (can.issue && canIssue(order.status) && holds) return "issue";
  if (can.build && canComplete(order.status)) return "complete";
  if (can.build && canReserve(order.status) && needsReserve) return "reserve";
  return null;
}

/** What weighing a spool back would issue, before the form is sent. */
export type WeighBack =
  /** Gross below the tare (or below 0): the server refuses it; nothing to show. */
  | { netNowKg: null; issueKg: null }
  /** The spool holds `netNowKg` now, so `issueKg` left it (0 or less: nothing to issue). */
  | { netNowKg: number; issueKg: number };

/**
 * The weigh-back of a held wire spool from the gross weight typed (a decimal comma
 * allowed): null while the spot cannot be weighed or the text is no number, so the
 * quantity is asked for instead.
 */
export function weighBackPreview(
  spot: { kind: string; tareKg: number | null; onHand: number } | undefined,
  grossText: string,
): WeighBack | null {
  if (spot?.kind !== "wire" || spot.tareKg === null) return null;
  if (typedNumber(grossText) === null) return null;
  return (
    spoolWeighBack(spot.onHand, grossText, spot.tareKg) ?? {
      netNowKg: null,
      issueKg: null,
    }
  );
}
