/**
 * Numbers typed as text (form fields, price-list cells, stored decimals): one length
 * limit checked before any pattern runs, and patterns that can split a run of digits in
 * one way only, so reading takes time in proportion to the text (a pattern such as
 * `\d+\.?\d*` can split "111…1x" at every place and takes the square of its length to
 * refuse it). Pure: runs in Node and in the browser.
 */
import { numberMarksOf, type SupportedLocale } from "./display-settings";
import { currentDisplaySettings, formatNumberForField } from "./format";

/** No number Turnledger reads is longer than this; longer text is refused before it is matched. */
export const maxNumberTextLength = 40;

/** True for text too long to be one of our numbers. */
export function isTooLongForNumber(text: string): boolean {
  return text.length > maxNumberTextLength;
}

/** "12", "-12.5", "12.", ".5": digits with at most one point. */
const decimalText = /^-?(?:\d+(?:\.\d*)?|\.\d+)$/;

/** Spaces people and Intl put between thousands: space, no-break space, narrow no-break space. */
const groupSpaces = /[ \u00a0\u202f]/g;
/** "1 234", "-12 345,5": thousands set apart by spaces (each alternative starts with its own character, so matching is linear). */
const spaceGrouped = /^-?\d{1,3}(?:[ \u00a0\u202f]\d{3})+(?:[.,]\d+)?$/;
/** Thousands grouped by the mark, then perhaps the other mark as decimal: "1,234,567.5", "1.234,5". */
const groupedText = {
  ",": /^-?[1-9]\d{0,2}(?:,\d{3})+(?:\.\d*)?$/,
  ".": /^-?[1-9]\d{0,2}(?:\.\d{3})+(?:,\d*)?$/,
};
/** One mark with exactly three digits after it, "1.250": a decimal or a thousands group. */
const oneGroupText = {
  ",": /^-?[1-9]\d{0,2},\d{3}$/,
  ".": /^-?[1-9]\d{0,2}\.\d{3}$/,
};

/** Text that is a number in the reader's locale written two ways: "1.250" in de-DE is 1250 or 1.25. */
export const ambiguousNumber = Symbol("ambiguous number");

/**
 * Number text as a person in `locale` types it, made plain ("1.234,5" → "1234.5"
 * in de-DE): the locale's decimal mark always; its thousands separator where it
 * groups digits in threes; the other decimal mark where it cannot be a thousands
 * group ("1.5" in de-DE, "1,25" in en-GB); spaces between thousands everywhere.
 * A single separator before exactly three digits that could be either ("1,250" in
 * en-GB, "1.250" in de-DE) is {@link ambiguousNumber}. Null for text that is no
 * number at all.
 */
export function plainNumberText(
  text: string,
  locale: SupportedLocale,
): string | typeof ambiguousNumber | null {
  let typed = text.trim();
  if (typed === "" || isTooLongForNumber(typed)) return null;
  // Intl writes a minus sign (U+2212) in some locales, fi-FI among them.
  if (typed.startsWith("\u2212")) typed = `-${typed.slice(1)}`;
  if (/[ \u00a0\u202f]/.test(typed)) {
    if (!spaceGrouped.test(typed)) return null;
    typed = typed.replace(groupSpaces, "");
  }
  const { decimal, group } = numberMarksOf(locale);
  const other = decimal === "." ? "," : ".";
  const hasDecimal = typed.includes(decimal);
  const hasOther = typed.includes(other);
  let plain = typed;
  if (hasOther && group === other) {
    // The other mark is this locale's thousands separator.
    if (
      groupedText[other].test(typed) &&
      (hasDecimal || countOf(typed, other) > 1)
    ) {
      plain = typed.split(other).join("");
    } else if (!hasDecimal && oneGroupText[other].test(typed)) {
      return ambiguousNumber;
    } else if (hasDecimal || countOf(typed, other) > 1) {
      return null;
    } else {
      // "1,5" in en-GB, "1.5" in de-DE: no thousands group, so a decimal mark.
      return decimalText.test(typed.replace(other, "."))
        ? typed.replace(other, ".")
        : null;
    }
  } else if (hasOther) {
    // fr-FR and fi-FI group with spaces: a point can only be a decimal mark.
    if (hasDecimal || countOf(typed, other) > 1) return null;
    plain = typed.replace(other, ".");
  }
  if (decimal === ",") plain = plain.replace(",", ".");
  return decimalText.test(plain) ? plain : null;
}

function countOf(text: string, mark: string): number {
  return text.split(mark).length - 1;
}

/**
 * A form's number field as the schema takes it, in the reader's locale
 * (app/lib/format.ts currentDisplaySettings): "1,25" → 1.25, "" → undefined.
 * Text that is no number (or is ambiguous, or longer than
 * {@link maxNumberTextLength}) stays text, so the schema names the field
 * ("The quantity must be a number.").
 */
export function formNumber(value: unknown): unknown {
  if (typeof value !== "string") return value;
  const trimmed = value.trim();
  if (trimmed === "") return undefined;
  const plain = plainNumberText(trimmed, currentDisplaySettings().locale);
  if (plain === null || plain === ambiguousNumber) return trimmed;
  const number = Number(plain);
  return Number.isFinite(number) ? number : trimmed;
}

/**
 * Why `text` is refused as a number when it is ambiguous in the reader's locale, in
 * words and in that locale's marks: in de-DE "1.250" → "“1.250” could mean 1250 or
 * 1,25: write 1250, or 1,25 for the decimal."; in en-GB "1,250" the same with "1.25".
 * Null for any other text (a number, or no number at all). fr-FR and fi-FI group
 * thousands with spaces, so a single point or comma there is always a decimal mark.
 */
export function ambiguousNumberMessage(text: unknown): string | null {
  if (typeof text !== "string") return null;
  const typed = text.trim();
  const { locale } = currentDisplaySettings();
  if (plainNumberText(typed, locale) !== ambiguousNumber) return null;
  const { decimal } = numberMarksOf(locale);
  const mark = decimal === "." ? "," : ".";
  const plain = typed.replace("\u2212", "-");
  const whole = formatNumberForField(plain.replace(mark, ""));
  const fraction = formatNumberForField(plain.replace(mark, "."));
  return `“${typed}” could mean ${whole} or ${fraction}: write ${whole}, or ${fraction} for the decimal.`;
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
