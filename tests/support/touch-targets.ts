/**
 * Phone-sized checks for browser tests: touch target sizes (WCAG 2.5.5 and
 * 2.5.8) and whether the page itself scrolls sideways.
 */
import type { Page } from "playwright-core";

/** A phone: an iPhone-sized viewport, touch, a mobile browser. */
export const phoneContext = {
  viewport: { width: 390, height: 844 },
  deviceScaleFactor: 3,
  hasTouch: true,
  isMobile: true,
} as const;

/**
 * The controls in view that are too small to touch, one line each: buttons,
 * form controls and links outside sentences under 44 × 44 CSS px (2.5.5, a
 * checkbox or radio button measured with the label around it, which takes the
 * tap too), links inside a sentence under 24 px tall on any of their lines
 * (2.5.8). Hidden controls (display: none, visually hidden) are not measured.
 */
export function undersizedTargets(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const found: string[] = [];
    const controls = document.querySelectorAll<HTMLElement>(
      "a[href], button, input:not([type=hidden]), select, textarea, summary, [tabindex='0']",
    );
    // No helper functions in here: the page runs this code as it is written.
    for (const element of controls) {
      const name = `${element.tagName.toLowerCase()} "${(
        element.getAttribute("aria-label") ||
        element.textContent ||
        element.getAttribute("name") ||
        ""
      )
        .trim()
        .replace(/\s+/g, " ")
        .slice(0, 40)}"`;
      const box = element.getBoundingClientRect();
      const style = getComputedStyle(element);
      // Not shown, or visually hidden (1 × 1 px, clipped) for screen readers alone.
      if (box.width <= 1 || box.height <= 1 || style.visibility === "hidden")
        continue;
      const inSentence =
        element.tagName === "A" &&
        style.display === "inline" &&
        (element.parentElement?.textContent ?? "").trim() !==
          (element.textContent ?? "").trim();
      if (inSentence) {
        const short = [...element.getClientRects()].find(
          (line) => line.height < 24,
        );
        if (short)
          found.push(`${name}: a line ${Math.round(short.height)} px tall`);
        continue;
      }
      const choice =
        element instanceof HTMLInputElement &&
        (element.type === "checkbox" || element.type === "radio");
      const target = (choice && element.closest("label")) || element;
      const { width, height } = target.getBoundingClientRect();
      if (width < 44 || height < 44)
        found.push(`${name}: ${Math.round(width)} × ${Math.round(height)} px`);
    }
    return found;
  });
}

/** How much wider than the viewport the page is (0 when it never scrolls sideways). */
export function pageOverflow(page: Page): Promise<number> {
  return page.evaluate(
    () =>
      document.documentElement.scrollWidth -
      document.documentElement.clientWidth,
  );
}
