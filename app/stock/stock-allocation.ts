/**
 * Which balances (item × lot × location) a reservation takes from: the oldest lot first
 * (received first, then lot id), then the location id; stock not kept in lots comes after
 * dated lots. Pure: no database.
 */

export interface FreeBalance {
  lotId: number;
  locationId: number;
  /** The lot's receipt date (YYYY-MM-DD); null for stock not kept in lots or an undated lot. */
  receivedOn: string | null;
  /** On hand less reserved, thousandths of the unit. */
  free: bigint;
}

export interface Allocation {
  lotId: number;
  locationId: number;
  quantity: bigint;
}

/** Oldest lot first: dated lots by date, then undated ones; ties by lot id, then location id. */
export function compareOldestFirst(
  a: Pick<FreeBalance, "lotId" | "locationId" | "receivedOn">,
  b: Pick<FreeBalance, "lotId" | "locationId" | "receivedOn">,
): number {
  if (a.receivedOn !== b.receivedOn) {
    if (a.receivedOn === null) return 1;
    if (b.receivedOn === null) return -1;
    return a.receivedOn < b.receivedOn ? -1 : 1;
  }
  if (a.lotId !== b.lotId) return a.lotId - b.lotId;
  return a.locationId - b.locationId;
}

/**
 * Takes up to `wanted` thousandths from the balances, oldest lot first. Returns what each
 * balance gives, the total and what is still short.
 */
export function allocateOldestFirst(
  balances: readonly FreeBalance[],
  wanted: bigint,
): { allocations: Allocation[]; allocated: bigint; short: bigint } {
  const allocations: Allocation[] = [];
  let left = wanted > 0n ? wanted : 0n;
  for (const balance of [...balances].sort(compareOldestFirst)) {
    if (left === 0n) break;
    if (balance.free <= 0n) continue;
    const quantity = balance.free < left ? balance.free : left;
    allocations.push({
      lotId: balance.lotId,
      locationId: balance.locationId,
      quantity,
    });
    left -= quantity;
  }
  const allocated = (wanted > 0n ? wanted : 0n) - left;
  return { allocations, allocated, short: left };
}
