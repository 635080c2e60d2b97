/**
 * A build order's pick list: for each line still to issue, what to take from which
 * location and lot. The rule, in this order:
 *
 * 1. what the order holds (its reservations), oldest lot first as the reservation took
 *    them (received day, then lot, then location: `compareOldestFirst`);
 * 2. for what is still not held, the free stock (on hand − reserved by any order), first
 *    in first out by the lot's received day in the same order, marked "not held": it is
 *    reserved for the order before it is issued;
 * 3. whatever neither covers is shown as short.
 *
 * A lot on hold (quality block) is never on the list, held for the order or not; what the
 * order holds on one is counted apart so the paper can say so. Quantities are worked in
 * thousandths of the unit so nothing drifts. Pure: no database.
 */
import { compareOldestFirst } from "~/stock/stock-allocation";

export interface PickSpotInput {
  lot: string | null;
  location: string;
  receivedOn: string | null;
  quantity: number;
}

export interface PickStockInput {
  lot: string | null;
  location: string;
  receivedOn: string | null;
  /** On hand less what every order holds there. */
  free: number;
  onHold: boolean;
}

export interface PickLineInput {
  sku: string;
  name: string;
  unit: string;
  required: number;
  issued: number;
  /** What this order holds, by lot and location. */
  held: PickSpotInput[];
  /** Where the item is, by lot and location. */
  stock: PickStockInput[];
}

export interface PickRow {
  location: string;
  lot: string | null;
  receivedOn: string | null;
  quantity: number;
  /** "held": reserved for this order; "free": not held yet, reserve before issuing. */
  source: "held" | "free";
}

export interface PickLine {
  sku: string;
  name: string;
  unit: string;
  /** Required − issued. */
  toIssue: number;
  rows: PickRow[];
  /** What neither the order's holdings nor the free stock cover. */
  short: number;
  /** What the order holds on lots now on hold (left off the list). */
  heldOnHeldLots: number;
}

const milli = (value: number) => Math.round(value * 1000);
const fromMilli = (value: number) => value / 1000;

/** Sorting key shape for compareOldestFirst: lot and location by their texts' order. */
function oldestFirst<
  T extends { lot: string | null; location: string; receivedOn: string | null },
>(a: T, b: T): number {
  if (a.receivedOn !== b.receivedOn)
    return compareOldestFirst(
      { lotId: 0, locationId: 0, receivedOn: a.receivedOn },
      { lotId: 0, locationId: 0, receivedOn: b.receivedOn },
    );
  const lot = (a.lot ?? "").localeCompare(b.lot ?? "");
  return lot !== 0 ? lot : a.location.localeCompare(b.location);
}

const spotKey = (spot: { lot: string | null; location: string }) =>
  `${spot.lot ?? ""}\u0000${spot.location}`;

/** The pick list of an order's lines; `open` false (built or cancelled) leaves nothing to pick. */
export function pickList(
  lines: readonly PickLineInput[],
  open: boolean,
): PickLine[] {
  if (!open) return [];
  return lines.flatMap((line) => {
    const toIssue = milli(line.required) - milli(line.issued);
    if (toIssue <= 0) return [];
    const held = new Set(line.stock.filter((spot) => spot.onHold).map(spotKey));
    let left = toIssue;
    let heldOnHeldLots = 0;
    const rows: PickRow[] = [];
    for (const spot of [...line.held].sort(oldestFirst)) {
      if (held.has(spotKey(spot))) {
        heldOnHeldLots += milli(spot.quantity);
        continue;
      }
      if (left <= 0) break;
      const take = Math.min(milli(spot.quantity), left);
      if (take <= 0) continue;
      rows.push({ ...pick(spot), quantity: fromMilli(take), source: "held" });
      left -= take;
    }
    for (const spot of line.stock
      .filter((each) => !each.onHold)
      .sort(oldestFirst)) {
      if (left <= 0) break;
      const take = Math.min(milli(spot.free), left);
      if (take <= 0) continue;
      rows.push({ ...pick(spot), quantity: fromMilli(take), source: "free" });
      left -= take;
    }
    return [
      {
        sku: line.sku,
        name: line.name,
        unit: line.unit,
        toIssue: fromMilli(toIssue),
        rows,
        short: fromMilli(Math.max(left, 0)),
        heldOnHeldLots: fromMilli(heldOnHeldLots),
      },
    ];
  });
}

function pick(spot: {
  lot: string | null;
  location: string;
  receivedOn: string | null;
}) {
  return {
    location: spot.location,
    lot: spot.lot,
    receivedOn: spot.receivedOn,
  };
}
