/**
 * The short codes Turnledger prints on its labels, and how a scanned or typed text is read
 * back. Pure: runs in Node and in the browser.
 *
 * The form of a code:
 * - a lot (wire spool or magnet batch): `L` and the lot's id in decimal digits, `L123`;
 * - a bin or store location: `B` and the location's code as kept, `BMAIN-A3`.
 *
 * The QR code holds the code as an address of the app, `<origin>/scan/L123`, so a phone's
 * camera opens the thing's page; the text printed under it is the bare code. A scanner
 * that types what it reads (a keyboard wedge) may send either, and both are read.
 *
 * Why this form for a keyboard wedge: a wedge types each character as a key press in the
 * keyboard layout it is set to, so shifted characters and punctuation are where surprises
 * happen (Caps Lock turns `L` into `l`; `:` and `/` sit on other keys in other layouts).
 * The bare code is one letter and then digits, or one letter and the location code (letters,
 * digits and the hyphen our location codes use), with no `:`, `/`, `?`, `%` or space to get
 * wrong. Reading ignores case and surrounding blanks, and takes a space after the letter
 * ("L 123", "b main-a3"), so Caps Lock, a scanner sending lower case and a person typing
 * the printed text all read the same. Location codes are matched without regard to case, as
 * the database compares them.
 *
 * Anything else is "foreign": another company's barcode, a GS1 code (digits, or text with
 * the group separator), an address of another host, an empty scan. A foreign code is never
 * looked up.
 */

export type ScanCode =
  { kind: "lot"; lotId: number } | { kind: "location"; code: string };

export type ScannedText = ScanCode | { kind: "foreign"; reason: string };

/** The path of the scan route, before the code. */
export const scanPathPrefix = "/scan/";

/** Location codes are at most 20 characters (locations.code). */
const locationCodeMaxLength = 20;
/** Lot ids are database int ids: at most 2³¹ − 1. */
const largestLotId = 2_147_483_647;
/** Nothing longer is read: a scanner never types a label's code longer than this. */
const scannedTextMaxLength = 300;

/** The bare code of a lot or location: "L123", "BMAIN-A3". */
export function scanCodeText(code: ScanCode): string {
  if (code.kind === "lot") {
    if (
      !Number.isSafeInteger(code.lotId) ||
      code.lotId < 1 ||
      code.lotId > largestLotId
    )
      throw new RangeError(`Not a lot id: ${code.lotId}`);
    return `L${code.lotId}`;
  }
  const location = code.code.trim();
  if (!isLocationCode(location))
    throw new RangeError(`Not a location code: "${code.code}"`);
  return `B${location}`;
}

/** The address the QR code holds: "<origin>/scan/L123" (origin without a trailing slash). */
export function scanCodeUrl(origin: string, code: ScanCode): string {
  return `${origin.replace(/\/+$/, "")}${scanPathPrefix}${encodeURIComponent(scanCodeText(code))}`;
}

/**
 * Reads a scanned or typed text: a bare code, the path "/scan/L123", or the whole address
 * of one of `ownOrigins` (the app's public address and the address the page was served
 * from). Anything else is foreign, with the reason in plain words.
 */
export function parseScannedText(
  text: string,
  ownOrigins: readonly string[] = [],
): ScannedText {
  const typed = text.trim();
  if (typed === "") return foreign("Nothing was scanned.");
  if (typed.length > scannedTextMaxLength)
    return foreign("This is not a Turnledger code: it is far too long.");
  // Control characters: the GS1 group separator (ASCII 29) and other non-printing keys.
  // eslint-disable-next-line no-control-regex
  if (/[\u0000-\u001f\u007f]/.test(typed))
    return foreign("This is not a Turnledger code (a GS1 or other barcode).");

  const address = /^[a-z][a-z0-9+.-]*:\/\//i.test(typed)
    ? addressPath(typed, ownOrigins)
    : { path: typed };
  if ("reason" in address) return foreign(address.reason);
  const path = address.path;
  const bare = path.toLowerCase().startsWith(scanPathPrefix)
    ? safelyDecoded(path.slice(scanPathPrefix.length))
    : path;
  if (bare === null) return foreign("This is not a Turnledger code.");
  return parseBareCode(bare.trim());
}

function parseBareCode(bare: string): ScannedText {
  const lot = /^l\s?(\d{1,10})$/i.exec(bare);
  if (lot) {
    const lotId = Number(lot[1]);
    if (lotId >= 1 && lotId <= largestLotId) return { kind: "lot", lotId };
    return foreign("This is not a Turnledger code: no lot has that number.");
  }
  const location = /^b\s?(.+)$/i.exec(bare);
  if (location && isLocationCode(location[1]!))
    return { kind: "location", code: location[1]!.toUpperCase() };
  return foreign("This is not a Turnledger code.");
}

/** The path of an address of our own, or why it is foreign. */
function addressPath(
  typed: string,
  ownOrigins: readonly string[],
): { path: string } | { reason: string } {
  let url: URL;
  try {
    url = new URL(typed);
  } catch {
    return { reason: "This is not a Turnledger code." };
  }
  const ownHosts = ownOrigins.flatMap((origin) => {
    try {
      return [new URL(origin).host.toLowerCase()];
    } catch {
      return [];
    }
  });
  if (
    !["http:", "https:"].includes(url.protocol) ||
    !ownHosts.includes(url.host.toLowerCase())
  )
    return {
      reason: `This code points to another address (${url.host || url.protocol}), not to Turnledger.`,
    };
  if (!url.pathname.toLowerCase().startsWith(scanPathPrefix))
    return { reason: "This is an address of Turnledger, not a label's code." };
  return { path: url.pathname };
}

function safelyDecoded(text: string): string | null {
  try {
    return decodeURIComponent(text);
  } catch {
    return null;
  }
}

/** Letters, digits, hyphen, dot and underscore, 1 to 20 characters, starting with a letter or digit. */
function isLocationCode(text: string): boolean {
  return (
    text.length <= locationCodeMaxLength &&
    /^[A-Za-z0-9][A-Za-z0-9._-]*$/.test(text)
  );
}

function foreign(reason: string): ScannedText {
  return { kind: "foreign", reason };
}
