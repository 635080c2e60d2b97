/**
 * What a scanned code stands for: a lot (its item, number and where it is) or a location.
 * The one reading of a scan on the server, for the scan page and the lookup API.
 */
import { appUrl } from "~/lib/app-url.server";
import { findLocationLabels, findLotLabels } from "./label-data.server";
import type { ScanLookupAnswer } from "./label-types";
import { parseScannedText, scanCodeText, type ScanCode } from "./scan-codes";

export type ScanLookup =
  | { status: "found"; answer: ScanLookupAnswer }
  | { status: "foreign"; message: string }
  | { status: "unknown"; message: string };

/** The origins a scanned address may carry: the public address and the one the request came to. */
export function ownOrigins(request: Request): string[] {
  return [appUrl(), new URL(request.url).origin];
}

export async function lookUpScannedText(
  text: string,
  origins: readonly string[],
): Promise<ScanLookup> {
  const read = parseScannedText(text, origins);
  if (read.kind === "foreign")
    return { status: "foreign", message: read.reason };
  return lookUpScanCode(read);
}

async function lookUpScanCode(code: ScanCode): Promise<ScanLookup> {
  if (code.kind === "lot") {
    const [lot] = await findLotLabels([code.lotId]);
    if (!lot)
      return {
        status: "unknown",
        message: `Unknown code ${scanCodeText(code)}: there is no such lot.`,
      };
    return {
      status: "found",
      answer: {
        kind: "lot",
        code: scanCodeText(code),
        lotId: lot.lotId,
        sku: lot.sku,
        name: lot.itemName,
        lot: lot.lotNumber,
        unit: lot.unit,
        onHand: lot.onHand,
        location: lot.locations.length === 1 ? lot.locations[0]! : null,
        locations: lot.locations,
      },
    };
  }
  const [location] = await findLocationLabels([code.code]);
  if (!location)
    return {
      status: "unknown",
      message: `Unknown code ${scanCodeText(code)}: there is no location ${code.code}.`,
    };
  return {
    status: "found",
    answer: { kind: "location", code: location.code, name: location.name },
  };
}
