/**
 * Accessibility scan of the page in view with axe-core (WCAG 2.1 A and AA
 * rules), for browser tests. The script is handed to the page through the
 * DevTools protocol, which the page's Content-Security-Policy does not govern,
 * so pages are scanned exactly as users get them.
 */
import { createRequire } from "node:module";
import fs from "node:fs";
import type { Page } from "playwright-core";
import type { AxeResults, Result } from "axe-core";

const axeSource = fs.readFileSync(
  createRequire(import.meta.url).resolve("axe-core/axe.min.js"),
  "utf8",
);

/** Violations of impact "serious" or "critical", one line each, with where they are. */
export async function seriousAccessibilityViolations(
  page: Page,
): Promise<string[]> {
  await page.evaluate(axeSource);
  const results = (await page.evaluate(() =>
    (
      window as unknown as {
        axe: { run: (context: Document, options: object) => Promise<unknown> };
      }
    ).axe.run(document, {
      runOnly: {
        type: "tag",
        values: ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"],
      },
      resultTypes: ["violations"],
    }),
  )) as AxeResults;
  return results.violations
    .filter(
      (violation) =>
        violation.impact === "serious" || violation.impact === "critical",
    )
    .map((violation) => describe(page.url(), violation));
}

function describe(url: string, violation: Result): string {
  const where = violation.nodes
    .slice(0, 3)
    .map((node) => node.target.join(" "))
    .join("; ");
  return `${url}: ${violation.id} (${violation.impact}) ${violation.help} — ${where}`;
}

/**
 * Scans the page and collects what it finds into `found`, so one journey can
 * visit many pages and assert once at the end that nothing serious was seen.
 * A page that says part of it is busy (aria-busy: figures dimmed while they
 * are worked out) is scanned once that part is done, so what is checked is
 * the page as it settles, not whichever moment of the update the scan meets.
 */
export async function scanPage(page: Page, found: string[]): Promise<void> {
  await page.waitForFunction(
    () => document.querySelector('[aria-busy="true"]') === null,
  );
  // Web fonts change how wide a table is; a table that then scrolls sideways is
  // made keyboard-reachable on the next frames (DataTable measures it).
  await page.evaluate(() =>
    document.fonts.ready.then(
      () =>
        new Promise((done) =>
          requestAnimationFrame(() => requestAnimationFrame(done)),
        ),
    ),
  );
  found.push(...(await seriousAccessibilityViolations(page)));
}
