/**
 * A buyer checks and imports a long price list by keyboard alone and sees the
 * rows' progress as the server reports it: a bar whose value rises through
 * counts between none and all ("24,000 of 60,000 rows checked"), for the
 * check and again for the import, with a polite status line that speaks now
 * and then rather than at every step. The page is scanned with axe-core while
 * the bar moves and when it is done.
 */
import fs from "node:fs";
import path from "node:path";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  scanPage,
  seriousAccessibilityViolations,
} from "../support/accessibility";
import { signInAs } from "../support/app-client";
import {
  launchBrowser,
  saveScreenshot,
  signIn,
  waitForHydration,
} from "../support/browser";
import { chooseOption, press } from "../support/keyboard";
import { chooseFileByKeyboard } from "../support/keyboard-files";
import { createSupplier } from "../support/price-list-fixtures";
import { closeTestDatabase, uniqueCode } from "../support/test-database";

/** Where the closing note picks up its screenshots. */
const notesShots = "/work/notes/shots";
const rowCount = 60_000;
const fileName = "sleeve-list-long.csv";

let browser: Browser;
let supplier = "";

beforeAll(async () => {
  browser = await launchBrowser();
  supplier = `Isolierhülsen Süd ${uniqueCode("P")}`;
  await createSupplier(await signInAs("buyer"), supplier);
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

function longPriceList() {
  const prefix = uniqueCode("SL");
  const lines = [
    "Art. no,Description,Kind,Unit,Price,Currency,Min qty,Valid from",
  ];
  for (let index = 0; index < rowCount; index += 1)
    lines.push(
      `${prefix}-${Math.floor(index / 4)},Glass braid sleeve ${index},part,pcs,0.35,EUR,${[1, 10, 100, 1000][index % 4]},2026-11-01`,
    );
  return {
    name: fileName,
    mimeType: "text/csv",
    buffer: Buffer.from(`${lines.join("\n")}\n`, "utf-8"),
  };
}

interface BarReading {
  name: string;
  now: number;
  max: number;
  text: string;
}

/** Starts recording, in the page, every value the progress bar shows and every status line a screen reader is given. */
async function recordProgress(page: Page, section: string): Promise<void> {
  await page.evaluate((sectionId) => {
    const seen = {
      bars: [] as BarReading[],
      spoken: [] as { text: string; at: number }[],
    };
    (window as unknown as { progressSeen: typeof seen }).progressSeen = seen;
    const region = document.querySelector(
      `section[aria-labelledby="${sectionId}"]`,
    )!;
    const record = () => {
      const bar = region.querySelector('[role="progressbar"]');
      if (bar) {
        const reading = {
          name:
            document.getElementById(bar.getAttribute("aria-labelledby") ?? "")
              ?.textContent ?? "",
          now: Number(bar.getAttribute("aria-valuenow")),
          max: Number(bar.getAttribute("aria-valuemax")),
          text: bar.getAttribute("aria-valuetext") ?? "",
        };
        const last = seen.bars.at(-1);
        if (
          !last ||
          last.name !== reading.name ||
          last.now !== reading.now ||
          last.max !== reading.max
        )
          seen.bars.push(reading);
      }
      // The progress's own status line (the check's findings have another, after it).
      const text = [...region.querySelectorAll('[role="status"]')]
        .map((status) => status.textContent ?? "")
        .find((said) =>
          /% sent\.$|opening it…$|rows (checked|imported)/.test(said),
        );
      if (text && seen.spoken.at(-1)?.text !== text)
        seen.spoken.push({ text, at: performance.now() });
    };
    new MutationObserver(record).observe(region, {
      subtree: true,
      childList: true,
      attributes: true,
      characterData: true,
    });
  }, section);
}

async function recorded(page: Page) {
  return page.evaluate(
    () =>
      (
        window as unknown as {
          progressSeen: {
            bars: BarReading[];
            spoken: { text: string; at: number }[];
          };
        }
      ).progressSeen,
  );
}

/** Waits until the bar named `name` shows a quarter of the rows or more but not all: the server is part-way. */
async function waitForRowsPartWay(page: Page, name: string): Promise<void> {
  await page.waitForFunction((barName) => {
    const bar = [...document.querySelectorAll('[role="progressbar"]')].find(
      (element) =>
        document.getElementById(element.getAttribute("aria-labelledby") ?? "")
          ?.textContent === barName,
    );
    const now = Number(bar?.getAttribute("aria-valuenow"));
    const max = Number(bar?.getAttribute("aria-valuemax"));
    return max > 100 && now >= max / 4 && now < max;
  }, name);
}

/** The rows bar's values, in order: they rise through counts between none and all. */
function expectRisingRows(bars: BarReading[], name: string, verb: string) {
  const rows = bars.filter(
    (reading) => reading.name === name && reading.max === rowCount,
  );
  const values = rows.map((reading) => reading.now);
  for (let index = 1; index < values.length; index += 1)
    expect(values[index]).toBeGreaterThanOrEqual(values[index - 1]!);
  const partWay = new Set(
    values.filter((value) => value > 0 && value < rowCount),
  );
  expect(
    partWay.size,
    `values seen: ${values.join(", ")}`,
  ).toBeGreaterThanOrEqual(2);
  const sample = rows.find(
    (reading) => reading.now > 0 && reading.now < rowCount,
  )!;
  expect(sample.text).toMatch(
    new RegExp(`^\\d{1,2},\\d{3} of 60,000 rows ${verb}$`),
  );
}

/** The status line speaks now and then: far fewer times than the bar moves, and never twice within three seconds. */
function expectThrottledAnnouncements(
  spoken: { text: string; at: number }[],
  barMoves: number,
) {
  const said = JSON.stringify(spoken);
  expect(spoken.length, said).toBeGreaterThan(0);
  expect(spoken.length, said).toBeLessThan(barMoves);
  for (let index = 1; index < spoken.length; index += 1)
    expect(spoken[index]!.at - spoken[index - 1]!.at, said).toBeGreaterThan(
      2_900,
    );
}

describe("price-list import progress in the browser", () => {
  it("shows rows checked, then rows imported, rising while the server works", async () => {
    const found: string[] = [];
    const page = await signIn(browser, "buyer");
    await page.goto(`${new URL(page.url()).origin}/suppliers/import`);
    await page
      .getByRole("heading", { name: "Import a price list", level: 1 })
      .waitFor();
    await waitForHydration(page);

    await chooseOption(
      page,
      page.getByLabel("Supplier", { exact: true }),
      `${supplier} (EUR)`,
    );
    await chooseFileByKeyboard(
      page,
      page.getByLabel("Price list (CSV or .xlsx, up to 20 MB)"),
      longPriceList(),
    );
    await page.getByText(`${fileName}:`).waitFor();
    await page.getByText("Every needed field has a column.").waitFor();

    // Step 3: the check's bar counts the rows as the server reads them.
    await recordProgress(page, "step-check");
    await press(page, page.getByRole("button", { name: "Check the rows" }));
    await waitForRowsPartWay(page, `Checking ${fileName}`);
    fs.mkdirSync(notesShots, { recursive: true });
    await page
      .getByRole("progressbar", { name: `Checking ${fileName}` })
      .scrollIntoViewIfNeeded();
    await page.screenshot({
      path: path.join(notesShots, "price-import-progress-check.png"),
    });
    found.push(...(await seriousAccessibilityViolations(page)));
    await page
      .getByRole("table", { name: "Rows as they will be stored" })
      .waitFor({ timeout: 60_000 });
    expect(
      await page
        .getByRole("progressbar", { name: `Checking ${fileName}` })
        .count(),
    ).toBe(0);
    const check = await recorded(page);
    expectRisingRows(check.bars, `Checking ${fileName}`, "checked");
    expectThrottledAnnouncements(check.spoken, check.bars.length);
    await scanPage(page, found);
    await saveScreenshot(page, "price-import-progress-1-checked");

    // Step 4: the import's bar counts them again as they are written.
    const importButton = page.getByRole("button", {
      name: "Import 60,000 rows",
    });
    await importButton.waitFor();
    await recordProgress(page, "step-import");
    await press(page, importButton);
    await waitForRowsPartWay(page, `Importing ${fileName}`);
    await page
      .getByRole("progressbar", { name: `Importing ${fileName}` })
      .scrollIntoViewIfNeeded();
    await page.screenshot({
      path: path.join(notesShots, "price-import-progress-import.png"),
    });
    found.push(...(await seriousAccessibilityViolations(page)));
    await page
      .getByText(`Imported 60,000 rows from ${fileName} for ${supplier}.`)
      .waitFor({ timeout: 90_000 });
    const imported = await recorded(page);
    expectRisingRows(imported.bars, `Importing ${fileName}`, "imported");
    expectThrottledAnnouncements(imported.spoken, imported.bars.length);
    await scanPage(page, found);
    await saveScreenshot(page, "price-import-progress-2-imported");
    expect(found).toEqual([]);
    await page.close();
    // 60,000 rows checked and imported take a few seconds alone, many times that on a busy machine.
  }, 240_000);
});
