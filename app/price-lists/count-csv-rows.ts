/**
 * Counts a CSV's data rows before they are read, so a long import can say
 * "12,000 of 100,000 rows". One pass over the text, no arrays: rows are split
 * the way Papa Parse splits them (a quotation mark at the start of a value
 * opens a quoted value, which ends at a quotation mark followed by the
 * separator, the line's end or the file's end — `""` inside is one quotation
 * mark), and a row counts as Papa Parse's reader counts it in
 * parse-price-list.ts: after the header line, and not blank.
 *
 * Exact for every file the reader reads to its end. A value whose quotation
 * mark is never closed swallows the rest of the file, as it does for the
 * reader, which stops there.
 *
 * Pure: runs in Node and in the browser.
 */

const quoteMark = 0x22;
const lineFeed = 0x0a;
const space = 0x20;

/** Whitespace as String.prototype.trim sees it, for the characters a price list holds. */
function isWhitespace(code: number): boolean {
  return (
    code === space ||
    code === 0x09 ||
    code === 0x0b ||
    code === 0x0c ||
    code === 0x0d ||
    code === 0xa0 ||
    code === 0xfeff
  );
}

/** True when text[from, to) holds only separators and whitespace. */
function isBlankText(
  text: string,
  from: number,
  to: number,
  separator: number,
): boolean {
  for (let at = from; at < to; at += 1) {
    const code = text.charCodeAt(at);
    if (code !== separator && !isWhitespace(code)) return false;
  }
  return true;
}

/**
 * The data rows of `text` (line breaks already LF) below the header on
 * `headerLine`, separated by `delimiter`.
 */
export function countCsvDataRows(
  text: string,
  delimiter: string,
  headerLine: number,
): number {
  const separator = delimiter.charCodeAt(0);
  const end = text.length;
  let line = 1;
  let rows = 0;
  let at = 0;
  let nextQuote = text.indexOf('"');
  while (at < end) {
    if (nextQuote !== -1 && nextQuote < at) nextQuote = text.indexOf('"', at);
    const lineEnd = text.indexOf("\n", at);
    const rowEnd = lineEnd === -1 ? end : lineEnd;
    if (nextQuote === -1 || nextQuote > rowEnd) {
      // No quotation mark on the line (most rows): the line is the row.
      if (line > headerLine && !isBlankText(text, at, rowEnd, separator))
        rows += 1;
      line += 1;
      at = rowEnd + 1;
      continue;
    }
    const rowLine = line;
    let blank = true;
    let valueStart = true;
    let rowEnded = false;
    while (at < end && !rowEnded) {
      const code = text.charCodeAt(at);
      if (valueStart && code === quoteMark) {
        const closed = skipQuotedValue(text, at + 1, separator);
        line += closed.lineBreaks;
        if (closed.filled) blank = false;
        if (closed.next === null) {
          // Never closed: the rest of the file is this value, and the reader stops here.
          return rows + (rowLine > headerLine ? 1 : 0);
        }
        at = closed.next;
        valueStart = false;
        continue;
      }
      if (code === lineFeed) {
        line += 1;
        rowEnded = true;
      } else if (code === separator) {
        valueStart = true;
      } else {
        valueStart = false;
        if (blank && code !== quoteMark && !isWhitespace(code)) blank = false;
      }
      at += 1;
    }
    if (rowLine > headerLine && !blank) rows += 1;
  }
  return rows;
}

/**
 * Reads a quoted value from just after its opening quotation mark: where
 * reading goes on (the separator, line feed or end after the closing mark),
 * or null when no mark closes it; the line breaks inside; whether it holds
 * anything but whitespace.
 */
function skipQuotedValue(
  text: string,
  from: number,
  separator: number,
): { next: number | null; lineBreaks: number; filled: boolean } {
  const end = text.length;
  let lineBreaks = 0;
  let filled = false;
  for (let at = from; at < end; at += 1) {
    const code = text.charCodeAt(at);
    if (code !== quoteMark) {
      if (code === lineFeed) lineBreaks += 1;
      else if (!filled && !isWhitespace(code)) filled = true;
      continue;
    }
    const following = at + 1 < end ? text.charCodeAt(at + 1) : -1;
    if (following === quoteMark) {
      filled = true;
      at += 1;
      continue;
    }
    let after = at + 1;
    while (after < end && text.charCodeAt(after) === space) after += 1;
    const next = after < end ? text.charCodeAt(after) : -1;
    if (next === -1 || next === separator || next === lineFeed)
      return { next: after, lineBreaks, filled };
    // Text after a closing mark: the reader reports the line, and the value goes on.
    filled = true;
  }
  return { next: null, lineBreaks, filled };
}
