/**
 * Numbers typed as text (form fields, price-list cells, stored decimals): one length
 * limit checked before any pattern runs, and patterns that can split a run of digits in
 * one way only, so reading takes time in proportion to the text (a pattern such as
 * `\d+\.?\d*` can split "111…1x" at every place and takes the square of its length to
 * refuse it). Pure: runs in Node and in the browser.
 */

/** No number Turnledger reads is longer than this; longer text is refused before it is matched. */
export const maxNumberTextLength = 40;

/** True for text too long to be one of our numbers. */
export function isTooLongForNumber(text: string): boolean {
  return text.length > maxNumberTextLength;
}

/** "12", "-12.5", "12.", ".5": digits with at most one point. */
const decimalText = /^-?(?:\d+(?:\.\d*)?|\.\d+)$/;
/** "12,5": a decimal comma between digits. */
const commaDecimalText = /^-?\d+,\d+$/;

/**
 * A form's number field as the schema takes it: "1,25" → 1.25, "" → undefined. Text
 * that is no plain decimal number (or longer than {@link maxNumberTextLength}) stays
 * text, so the schema names the field ("The quantity must be a number.").
 */
export function formNumber(value: unknown): unknown {
  if (typeof value !== "string") return value;
  const trimmed = value.trim();
  if (trimmed === "") return undefined;
  if (isTooLongForNumber(trimmed)) return trimmed;
  const normalised = commaDecimalText.test(trimmed)
    ? trimmed.replace(",", ".")
    : trimmed;
  const number = Number(normalised);
  return decimalText.test(normalised) && Number.isFinite(number)
    ? number
    : trimmed;
}

/**
 * A number typed in a field, read as {@link formNumber} reads it (a decimal comma
 * allowed), for what a page shows while you type: "4,6" → 4.6; null while the text is
 * empty or no plain decimal number.
 */
export function typedNumber(text: string): number | null {
  const value = formNumber(text);
  return typeof value === "number" ? value : null;
}

/** "1.2500" → "1.25", "0.000" → "0.", "100" → "1": the text without its last zeros (no pattern). */
export function withoutTrailingZeros(text: string): string {
  let end = text.length;
  while (end > 0 && text.charCodeAt(end - 1) === 48) end -= 1;
  return text.slice(0, end);
}

/** "12.5000" → "12.5", "1.000" → "1", "120" → "120": decimal text as a person writes it. */
export function plainDecimalText(decimalText: string): string {
  if (!decimalText.includes(".")) return decimalText;
  const trimmed = withoutTrailingZeros(decimalText);
  return trimmed.endsWith(".") ? trimmed.slice(0, -1) : trimmed;
}

/**
 * The text without `suffix` at its end (any letter case) and the spaces before it:
 * "0.5 mm" → "0.5" for "mm". Unchanged when it does not end so. No pattern.
 */
export function withoutSuffix(text: string, suffix: string): string {
  if (text.length < suffix.length) return text;
  const end = text.slice(text.length - suffix.length);
  if (end.toLowerCase() !== suffix.toLowerCase()) return text;
  return text.slice(0, text.length - suffix.length).trimEnd();
}
