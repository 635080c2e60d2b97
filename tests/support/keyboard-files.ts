/**
 * Files in and out of a page by keyboard alone, for browser tests: a file
 * input is reached by Tab and opened with Space (the test answers the file
 * chooser), a download link is reached by Tab and followed with Enter. Pages
 * from launchBrowser() intercept file choosers from the start, so the chooser
 * a key opens is always reported (tests/support/browser.ts).
 */
import fs from "node:fs";
import type { Locator, Page } from "playwright-core";
import { tabTo } from "./keyboard";

export interface FileToChoose {
  name: string;
  mimeType: string;
  buffer: Buffer;
}

/** Tabs to a file input, opens its chooser with Space and picks `file` in it. */
export async function chooseFileByKeyboard(
  page: Page,
  input: Locator,
  file: FileToChoose,
  options: { backwards?: boolean } = {},
): Promise<void> {
  await tabTo(page, input, options);
  const [chooser] = await Promise.all([
    page.waitForEvent("filechooser", { timeout: 5_000 }),
    page.keyboard.press("Space"),
  ]);
  await chooser.setFiles(file);
}

/** Tabs to a download link, follows it with Enter; returns the suggested file name and the text saved. */
export async function downloadByKeyboard(
  page: Page,
  link: Locator,
): Promise<{ fileName: string; text: string }> {
  await tabTo(page, link);
  const [download] = await Promise.all([
    page.waitForEvent("download", { timeout: 10_000 }),
    page.keyboard.press("Enter"),
  ]);
  const failure = await download.failure();
  if (failure) throw new Error(`the download failed: ${failure}`);
  const saved = await download.path();
  return {
    fileName: download.suggestedFilename(),
    text: fs.readFileSync(saved, "utf8"),
  };
}
