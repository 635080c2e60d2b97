/**
 * Turns the bytes of an uploaded price list into text.
 *
 * Supplier files arrive as UTF-8 (with or without a byte order mark), as
 * Windows-1252 from older spreadsheet exports, and now and then as UTF-16 with a
 * byte order mark ("Unicode text" exports). Anything that is not text, such as a
 * workbook or a PDF renamed to .csv, is refused with a message the buyer can act
 * on. Bad files are answered with `{ ok: false, message }`, never by throwing.
 *
 * Pure: runs in Node and in the browser (TextDecoder is global in both).
 */

/** The largest price list accepted, in bytes (20 MB). */
export const maxPriceListBytes = 20 * 1024 * 1024;

export type PriceListEncoding =
  "utf-8" | "windows-1252" | "utf-16le" | "utf-16be";

export type DecodedPriceList =
  | {
      ok: true;
      text: string;
      encoding: PriceListEncoding;
      /** The file started with a byte order mark (it is not part of `text`). */
      hadByteOrderMark: boolean;
    }
  | { ok: false; message: string };

export const fileTooLargeMessage = "The file is larger than 20 MB.";
export const emptyFileMessage = "The file is empty.";
export const notTextMessage = "This file is not a text CSV.";

/** The message for a file over {@link maxPriceListBytes}, or null when its size is fine. */
export function checkPriceListSize(byteLength: number): string | null {
  return byteLength > maxPriceListBytes ? fileTooLargeMessage : null;
}

/**
 * Decodes an uploaded price list: size check, empty check, encoding detection
 * (UTF-16 by its byte order mark, else UTF-8 when the bytes are valid UTF-8, else
 * Windows-1252), then a check that the result is text and not a binary file.
 */
export function decodePriceListBytes(bytes: Uint8Array): DecodedPriceList {
  const tooLarge = checkPriceListSize(bytes.byteLength);
  if (tooLarge) return { ok: false, message: tooLarge };
  if (bytes.byteLength === 0) return { ok: false, message: emptyFileMessage };

  const workbook = describeKnownBinary(bytes);
  if (workbook) return { ok: false, message: `${notTextMessage} ${workbook}` };

  const { text, encoding, hadByteOrderMark } = decodeText(bytes);
  if (looksBinary(text)) return { ok: false, message: notTextMessage };
  if (text.trim() === "") return { ok: false, message: emptyFileMessage };
  return { ok: true, text, encoding, hadByteOrderMark };
}

function decodeText(bytes: Uint8Array): {
  text: string;
  encoding: PriceListEncoding;
  hadByteOrderMark: boolean;
} {
  if (startsWith(bytes, [0xff, 0xfe])) {
    return {
      text: new TextDecoder("utf-16le").decode(bytes),
      encoding: "utf-16le",
      hadByteOrderMark: true,
    };
  }
  if (startsWith(bytes, [0xfe, 0xff])) {
    return {
      text: new TextDecoder("utf-16be").decode(bytes),
      encoding: "utf-16be",
      hadByteOrderMark: true,
    };
  }
  const hadByteOrderMark = startsWith(bytes, [0xef, 0xbb, 0xbf]);
  try {
    // `fatal` makes invalid UTF-8 throw instead of turning into U+FFFD; the
    // decoder drops a leading byte order mark by itself.
    const text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
    return { text, encoding: "utf-8", hadByteOrderMark };
  } catch {
    return {
      text: decodeWindows1252(bytes),
      encoding: "windows-1252",
      hadByteOrderMark: false,
    };
  }
}

/**
 * Characters of bytes 0x80–0x9F in Windows-1252 (WHATWG Encoding Standard).
 * Bytes 0x81, 0x8D, 0x8F, 0x90 and 0x9D have no character and stay as they are.
 */
const windows1252HighControls: Readonly<Record<number, string>> = {
  0x80: "€",
  0x82: "‚",
  0x83: "ƒ",
  0x84: "„",
  0x85: "…",
  0x86: "†",
  0x87: "‡",
  0x88: "ˆ",
  0x89: "‰",
  0x8a: "Š",
  0x8b: "‹",
  0x8c: "Œ",
  0x8e: "Ž",
  0x91: "‘",
  0x92: "’",
  0x93: "“",
  0x94: "”",
  0x95: "•",
  0x96: "–",
  0x97: "—",
  0x98: "˜",
  0x99: "™",
  0x9a: "š",
  0x9b: "›",
  0x9c: "œ",
  0x9e: "ž",
  0x9f: "Ÿ",
};

/**
 * Windows-1252 through the platform's TextDecoder. Some Node.js releases
 * (20.18.3 onwards, nodejs/node#56542) decode bytes 0x80–0x9F as Latin-1 control
 * characters instead of "€", "–", "’" …; browsers do it right. Mapping those
 * code points afterwards gives the same text everywhere (a no-op in browsers).
 */
function decodeWindows1252(bytes: Uint8Array): string {
  return new TextDecoder("windows-1252")
    .decode(bytes)
    .replace(
      /[\u0080-\u009f]/g,
      (control) => windows1252HighControls[control.charCodeAt(0)] ?? control,
    );
}

/** More than 1 in 100 characters being control characters means binary. */
const maxControlShare = 0.01;

/**
 * True for text that cannot be a CSV: any NUL character, or a high share of
 * control characters other than tab, line feed and carriage return.
 */
function looksBinary(text: string): boolean {
  if (text.includes("\u0000")) return true;
  let controls = 0;
  for (let index = 0; index < text.length; index += 1) {
    const code = text.charCodeAt(index);
    const isControl =
      (code < 0x20 && code !== 0x09 && code !== 0x0a && code !== 0x0d) ||
      (code >= 0x7f && code <= 0x9f);
    if (isControl) controls += 1;
  }
  return controls > text.length * maxControlShare;
}

/** A hint for file types buyers often upload by mistake, recognised by their first bytes. */
function describeKnownBinary(bytes: Uint8Array): string | null {
  if (startsWith(bytes, [0x50, 0x4b, 0x03, 0x04])) {
    return "It looks like a spreadsheet workbook or a ZIP archive: upload an .xlsx workbook as it is, or open it in the spreadsheet program, save it as CSV and upload that file.";
  }
  if (startsWith(bytes, [0xd0, 0xcf, 0x11, 0xe0])) {
    return "It looks like an older .xls workbook, or a workbook protected with a password: open it in the spreadsheet program, save it as .xlsx (Excel workbook, without a password) or as CSV and upload that file.";
  }
  if (startsWith(bytes, [0x25, 0x50, 0x44, 0x46])) {
    return "It looks like a PDF: ask the supplier for the price list as CSV, or as a spreadsheet to save as CSV.";
  }
  return null;
}

function startsWith(bytes: Uint8Array, prefix: readonly number[]): boolean {
  return (
    bytes.byteLength >= prefix.length &&
    prefix.every((byte, index) => bytes[index] === byte)
  );
}
