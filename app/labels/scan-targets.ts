/**
 * The addresses a scan leads to and the record page's address after a scan. Pure: runs in
 * Node and in the browser.
 */
import type { MovementType } from "~/db/tables/stock-enums";

/** The record page with a location chosen: "/stock/record?location=MAIN-A3". */
export function recordPageWithLocation(code: string): string {
  return `/stock/record?${new URLSearchParams({ location: code })}`;
}

/**
 * The record page's address after a scan: the kind of movement kept, the item, lot and
 * location of what was scanned (a location scan keeps the item and lot already chosen).
 */
export function recordPageAfterScan(
  current: URLSearchParams,
  type: MovementType,
  scanned:
    | { kind: "lot"; sku: string; lot: string; location: string | null }
    | { kind: "location"; code: string },
): string {
  const next = new URLSearchParams({ type });
  if (scanned.kind === "lot") {
    next.set("sku", scanned.sku);
    next.set("lot", scanned.lot);
    if (scanned.location) next.set("location", scanned.location);
  } else {
    for (const kept of ["sku", "lot"])
      if (current.get(kept)) next.set(kept, current.get(kept)!);
    next.set("location", scanned.code);
  }
  return `/stock/record?${next}`;
}

/** What a scan filled, as the scan panel says it. */
export function scanFillText(
  scanned:
    | {
        kind: "lot";
        sku: string;
        name: string;
        lot: string;
        location: string | null;
        locations: string[];
      }
    | { kind: "location"; code: string; name: string },
): string {
  if (scanned.kind === "location")
    return `Location ${scanned.code} (${scanned.name}) filled.`;
  const lot = `Lot ${scanned.lot} of ${scanned.sku} ${scanned.name}`;
  if (scanned.location)
    return `${lot} at ${scanned.location}: item, lot and location filled.`;
  if (scanned.locations.length > 1)
    return `${lot}: item and lot filled. It is at ${scanned.locations.join(", ")}: choose the location.`;
  return `${lot}: item and lot filled. It has no stock left in any location.`;
}
