/** Picks what is in force today from dated histories (metal base, currency rates). */

/**
 * The entry in force on `day` for each key: the one with the latest validFrom
 * not after `day`. Entries dated later are not yet in force. Sorted by key.
 */
export function entriesInForce<Entry extends { validFrom: string }>(
  entries: readonly Entry[],
  keyOf: (entry: Entry) => string,
  day: string,
): Entry[] {
  const current = new Map<string, Entry>();
  for (const entry of entries) {
    if (entry.validFrom > day) continue;
    const key = keyOf(entry);
    const known = current.get(key);
    if (!known || entry.validFrom > known.validFrom) current.set(key, entry);
  }
  return [...current.entries()]
    .sort(([a], [b]) => a.localeCompare(b))
    .map(([, entry]) => entry);
}
