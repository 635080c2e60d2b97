/**
 * Using a page by keyboard alone, for browser tests: focus moves only by Tab
 * (never by clicking or `locator.focus()`), fields are typed into, choices made
 * with the arrow keys and buttons pressed with Enter or Space. A control that
 * Tab never reaches fails the test, so a form that needs a mouse cannot pass.
 */
import type { Locator, Page } from "playwright-core";

/** How many Tab presses to try before deciding a control cannot be reached. */
const maxTabs = 200;

/**
 * Presses Tab (Shift+Tab with `backwards`) until `target` has the focus; throws
 * when it never does. The target is looked up afresh before each press, so an
 * element React puts in place of another while the page re-renders is the one
 * tabbed to, never the one it replaced.
 */
export async function tabTo(
  page: Page,
  target: Locator,
  options: { backwards?: boolean } = {},
): Promise<void> {
  for (let presses = 0; presses < maxTabs; presses += 1) {
    const focused = await target.evaluate(
      (element) => element === document.activeElement,
    );
    if (focused) return;
    await page.keyboard.press(options.backwards ? "Shift+Tab" : "Tab");
  }
  throw new Error(
    `tabTo: ${maxTabs} presses of Tab never reached ${target}: it cannot be used by keyboard`,
  );
}

/**
 * Tabs to a text field, selects what is in it and types `text` in its place;
 * throws when the field does not hold `text` afterwards (the keys went
 * elsewhere: the field lost the focus while it was typed into).
 */
export async function typeInto(
  page: Page,
  field: Locator,
  text: string,
): Promise<void> {
  await tabTo(page, field);
  await page.keyboard.press("ControlOrMeta+A");
  await page.keyboard.press("Delete");
  if (text !== "") await page.keyboard.type(text);
  const value = await field.inputValue();
  if (value !== text)
    throw new Error(
      `typeInto: ${field} holds "${value}" after typing "${text}": it lost the keyboard focus`,
    );
}

/**
 * Tabs to a <select> and picks the option whose label is `label` with the
 * arrow keys (Home first, then Down until it is chosen).
 */
export async function chooseOption(
  page: Page,
  select: Locator,
  label: string,
): Promise<void> {
  await tabTo(page, select);
  const labels = await select
    .locator("option")
    .evaluateAll((options) =>
      options.map((option) => (option.textContent ?? "").trim()),
    );
  const index = labels.indexOf(label);
  if (index < 0)
    throw new Error(
      `chooseOption: no option "${label}" (there are: ${labels.join(", ")})`,
    );
  await page.keyboard.press("Home");
  for (let step = 0; step < index; step += 1)
    await page.keyboard.press("ArrowDown");
  const chosen = await select.evaluate(
    (element) =>
      (element as HTMLSelectElement).selectedOptions[0]?.textContent?.trim() ??
      "",
  );
  if (chosen !== label)
    throw new Error(
      `chooseOption: the arrow keys chose "${chosen}", not "${label}"`,
    );
}

/** Tabs to a button (or link) and presses Enter on it. */
export async function press(page: Page, control: Locator): Promise<void> {
  await tabTo(page, control);
  await page.keyboard.press("Enter");
}

/** Tabs to a checkbox or radio button and toggles it with Space. */
export async function toggle(page: Page, control: Locator): Promise<void> {
  await tabTo(page, control);
  await page.keyboard.press("Space");
}

/**
 * Picks a radio button as a keyboard user does: Tab stops once on its group
 * (at the checked button, or the first), then the arrow keys move the choice
 * until `radio` is checked.
 */
export async function chooseRadio(page: Page, radio: Locator): Promise<void> {
  const inGroup = () =>
    radio.evaluate((element) => {
      const focused = document.activeElement;
      return (
        focused instanceof HTMLInputElement &&
        focused.type === "radio" &&
        focused.name === (element as HTMLInputElement).name &&
        focused.form === (element as HTMLInputElement).form
      );
    });
  for (let presses = 0; !(await inGroup()); presses += 1) {
    if (presses >= maxTabs)
      throw new Error(
        `chooseRadio: ${maxTabs} presses of Tab never reached the group of ${radio}`,
      );
    await page.keyboard.press("Tab");
  }
  const groupSize = await radio.evaluate(
    (element) =>
      document.getElementsByName((element as HTMLInputElement).name).length,
  );
  for (let step = 0; step <= groupSize; step += 1) {
    if (await radio.isChecked()) return;
    await page.keyboard.press("ArrowDown");
  }
  throw new Error(`chooseRadio: the arrow keys never checked ${radio}`);
}
