/** Reading figures off a page that updates in place, for browser tests. */
import type { Page } from "playwright-core";

/** Text with the no-break spaces between numbers and units as plain spaces. */
export const readable = (text: string | null) =>
  (text ?? "").replace(/\u00a0/g, " ");

/** Polls `read` until its (readable) text matches `expected`; returns that text. */
export async function waitForText(
  page: Page,
  read: () => Promise<string>,
  expected: RegExp,
  timeoutMs = 10_000,
): Promise<string> {
  const started = Date.now();
  let last = "";
  while (Date.now() - started < timeoutMs) {
    last = readable(await read().catch(() => ""));
    if (expected.test(last)) return last;
    await page.waitForTimeout(100);
  }
  throw new Error(`expected ${expected}, last saw "${last}"`);
}
