/**
 * Room for a chart's labels, worked out before the chart is drawn (the charts render on
 * the server, where no text can be measured): an upper estimate of a text's width, so
 * a margin made that wide holds the whole label and nothing has to be shortened or is
 * cut off at the chart's edge. Pure.
 *
 * The widths are generous per-character shares of the font size for a proportional sans
 * (Work Sans, the app's font); they are an estimate, not metrics read from the font, and
 * the browser tests check in Chromium that every label lies inside its chart.
 */

const narrow = new Set([..." .,:;'|!ilIjtfr()[]·-"]);
const wide = new Set([..."MWmw@%—"]);

/** Width of one character as a share of the font size (an upper estimate). */
function characterShare(character: string): number {
  if (narrow.has(character)) return 0.36;
  if (wide.has(character)) return 0.92;
  if (character >= "A" && character <= "Z") return 0.72;
  if (character >= "0" && character <= "9") return 0.62;
  return 0.6;
}

/** An upper estimate of `text`'s width in px at `fontSize` px (bold adds a tenth). */
export function estimatedTextWidth(
  text: string,
  fontSize: number,
  options: { bold?: boolean } = {},
): number {
  let shares = 0;
  for (const character of text) shares += characterShare(character);
  return shares * fontSize * (options.bold ? 1.1 : 1);
}

/** The widest of the texts, px (0 for none). */
export function widestText(
  texts: readonly string[],
  fontSize: number,
  options: { bold?: boolean } = {},
): number {
  return Math.max(
    0,
    ...texts.map((text) => estimatedTextWidth(text, fontSize, options)),
  );
}

/**
 * `text` in lines of at most `maxCharacters`, broken at spaces; a word longer than a
 * line is broken inside. Nothing is left out: the lines joined with spaces give the
 * text back (spaces at the breaks aside).
 */
export function wrapLabel(text: string, maxCharacters: number): string[] {
  const lines: string[] = [];
  let line = "";
  for (const word of text.split(/\s+/).filter(Boolean)) {
    let rest = word;
    while (rest.length > maxCharacters) {
      if (line) {
        lines.push(line);
        line = "";
      }
      lines.push(rest.slice(0, maxCharacters));
      rest = rest.slice(maxCharacters);
    }
    if (!line) line = rest;
    else if (line.length + 1 + rest.length <= maxCharacters)
      line = `${line} ${rest}`;
    else {
      lines.push(line);
      line = rest;
    }
  }
  if (line) lines.push(line);
  return lines;
}
