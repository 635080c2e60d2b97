/**
 * Issues net of returns, from the journal's own rows: what a lot gave each build order, or
 * what each lot gave one build order. An issue's quantity is signed in the journal (− out
 * of the store), a return's + (back into it). Pure: quantities in thousandths (bigint), as
 * the ledger keeps them, so the sums are exact.
 */

export interface IssueOrReturn<Key> {
  /** The build order (or lot) the movement belongs to. */
  key: Key;
  type: "issue" | "return";
  /** The journal's signed quantity, thousandths of the unit. */
  quantity: bigint;
  at: Date;
}

export interface IssueTotals<Key> {
  key: Key;
  issued: bigint;
  returned: bigint;
  /** Issued − returned. */
  net: bigint;
  /** The first issue; null when there were only returns. */
  firstIssuedAt: Date | null;
  lastMovementAt: Date;
}

/** Sums issues and returns per key, in the order of each key's first movement. */
export function issueTotals<Key>(
  movements: readonly IssueOrReturn<Key>[],
): IssueTotals<Key>[] {
  const totals = new Map<Key, IssueTotals<Key> & { firstAt: Date }>();
  for (const movement of movements) {
    let total = totals.get(movement.key);
    if (!total) {
      total = {
        key: movement.key,
        issued: 0n,
        returned: 0n,
        net: 0n,
        firstIssuedAt: null,
        lastMovementAt: movement.at,
        firstAt: movement.at,
      };
      totals.set(movement.key, total);
    }
    const amount =
      movement.quantity < 0n ? -movement.quantity : movement.quantity;
    if (movement.type === "issue") {
      total.issued += amount;
      if (!total.firstIssuedAt || movement.at < total.firstIssuedAt)
        total.firstIssuedAt = movement.at;
    } else {
      total.returned += amount;
    }
    total.net = total.issued - total.returned;
    if (movement.at > total.lastMovementAt) total.lastMovementAt = movement.at;
    if (movement.at < total.firstAt) total.firstAt = movement.at;
  }
  return [...totals.values()]
    .sort((a, b) => a.firstAt.getTime() - b.firstAt.getTime())
    .map((total) => ({
      key: total.key,
      issued: total.issued,
      returned: total.returned,
      net: total.net,
      firstIssuedAt: total.firstIssuedAt,
      lastMovementAt: total.lastMovementAt,
    }));
}
