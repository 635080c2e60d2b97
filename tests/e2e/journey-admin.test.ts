/**
 * The admin's journey, by keyboard alone from sign-in to done: invite a new
 * person on /admin/people (a first try without a role is refused beside the
 * roles), the invited person opens the link from the e-mail the SMTP fake
 * received, chooses a password at /set-password (a mismatch first), lands
 * signed in, signs out and signs in again with the new password; the admin
 * then sees the account active. Every page is scanned with axe-core.
 */
import type { Browser, Locator, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, uniqueEmail } from "../support/app-client";
import { scanPage } from "../support/accessibility";
import {
  launchBrowser,
  saveScreenshot,
  waitForHydration,
} from "../support/browser";
import { followLink, mainLink, signInByKeyboard } from "../support/journey";
import { press, toggle, typeInto } from "../support/keyboard";
import { linkIn, waitForMessage } from "../support/mail-fake-client";
import { readable } from "../support/page-text";
import { closeTestDatabase, testDatabase } from "../support/test-database";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

const newcomer = {
  name: "Aino Brightwater",
  email: uniqueEmail("aino"),
  password: "stator-slot-42",
};

/** The newcomer's row in the people table, as plain text. */
async function peopleRow(page: Page): Promise<string> {
  return readable(
    await page
      .getByRole("table", { name: "People with an account" })
      .getByRole("row")
      .filter({ hasText: newcomer.email })
      .textContent(),
  );
}

/** The newcomer's account as stored: whether a password is set, and the roles. */
async function storedAccount() {
  const [rows] = await testDatabase().query(
    `SELECT users.password_hash IS NOT NULL AS hasPassword, users.active,
            GROUP_CONCAT(user_roles.role ORDER BY user_roles.role) AS roles
       FROM users LEFT JOIN user_roles ON user_roles.user_id = users.id
      WHERE users.email = ? GROUP BY users.id`,
    [newcomer.email],
  );
  return (rows as { hasPassword: number; active: number; roles: string }[])[0];
}

/** The text of the elements a field's aria-describedby names (what a screen reader reads after the label). */
function descriptionOf(field: Locator): Promise<string> {
  return field.evaluate((element) =>
    (element.getAttribute("aria-describedby") ?? "")
      .split(/\s+/)
      .map((id) => document.getElementById(id)?.textContent?.trim() ?? "")
      .filter((text) => text !== "")
      .join(" "),
  );
}

/** Fills the sign-in form by keyboard and waits for the start page greeting the person. */
async function signInAsNewcomer(page: Page, found: string[]): Promise<void> {
  await page.getByRole("heading", { level: 1, name: "Sign in" }).waitFor();
  await scanPage(page, found);
  await typeInto(page, page.getByLabel("E-mail"), newcomer.email);
  await typeInto(page, page.getByLabel("Password"), newcomer.password);
  await press(page, page.getByRole("button", { name: "Sign in" }));
  await page
    .getByRole("heading", { level: 1, name: "Good to see you, Aino" })
    .waitFor();
  await scanPage(page, found);
}

describe("the admin's journey", () => {
  const found: string[] = [];
  let admin: Page;
  let invitationLink = "";

  it("signs in and invites a person as builder and manager", async () => {
    admin = await signInByKeyboard(browser, "admin", found);
    await followLink(admin, mainLink(admin, "People"), "People", found);
    const invite = admin.getByRole("region", { name: "Invite someone" });
    await typeInto(admin, invite.getByLabel("Name"), newcomer.name);
    await typeInto(admin, invite.getByLabel("E-mail"), newcomer.email);

    // Without a role the invitation is refused beside the roles, and nothing is stored.
    await press(admin, invite.getByRole("button", { name: "Send invitation" }));
    await invite.getByText("Choose at least one role.").waitFor();
    expect(await storedAccount()).toBeUndefined();
    await scanPage(admin, found);
    await saveScreenshot(admin, "journey-admin-1-invite-needs-role");

    await toggle(admin, invite.getByRole("checkbox", { name: "Builder" }));
    await toggle(admin, invite.getByRole("checkbox", { name: "Manager" }));
    await press(admin, invite.getByRole("button", { name: "Send invitation" }));
    // Told at the top of the page, in the shell's status line.
    await admin
      .getByRole("status")
      .getByText(`Invitation sent to ${newcomer.email}.`)
      .waitFor();
    expect(await peopleRow(admin)).toContain("Invited, no password yet");
    expect(await peopleRow(admin)).toContain("Builder, Manager");
    expect(await storedAccount()).toEqual({
      hasPassword: 0,
      active: 1,
      roles: "builder,manager",
    });
    await scanPage(admin, found);
    await saveScreenshot(admin, "journey-admin-2-invited");

    const mail = await waitForMessage(newcomer.email, /invited to Turnledger/);
    invitationLink = linkIn(mail);
    expect(new URL(invitationLink).pathname).toBe("/set-password");
  });

  it("the invited person opens the link, chooses a password and is signed in", async () => {
    const context = await browser.newContext({
      viewport: { width: 1280, height: 800 },
    });
    const page = await context.newPage();
    const link = new URL(invitationLink);
    await page.goto(`${baseUrl()}${link.pathname}${link.search}`);
    await page
      .getByRole("heading", { level: 1, name: "Welcome: choose your password" })
      .waitFor();
    await waitForHydration(page);
    expect(await descriptionOf(page.getByLabel("New password"))).toBe(
      "At least 10 characters.",
    );
    await scanPage(page, found);
    await saveScreenshot(page, "journey-admin-3-set-password");

    // Two different passwords are refused beside the second field.
    await typeInto(page, page.getByLabel("New password"), newcomer.password);
    await typeInto(page, page.getByLabel("The same again"), "stator-slot-24");
    await press(
      page,
      page.getByRole("button", { name: "Save password and sign in" }),
    );
    await page.getByText("The two passwords differ.").waitFor();
    expect(await descriptionOf(page.getByLabel("The same again"))).toBe(
      "The two passwords differ.",
    );
    expect((await storedAccount())?.hasPassword).toBe(0);
    await scanPage(page, found);
    await saveScreenshot(page, "journey-admin-4-passwords-differ");

    await typeInto(page, page.getByLabel("New password"), newcomer.password);
    await typeInto(page, page.getByLabel("The same again"), newcomer.password);
    await press(
      page,
      page.getByRole("button", { name: "Save password and sign in" }),
    );
    await page
      .getByRole("heading", { level: 1, name: "Good to see you, Aino" })
      .waitFor();
    expect(
      await page.getByText("You work here as builder and manager.").count(),
    ).toBe(1);
    expect((await storedAccount())?.hasPassword).toBe(1);
    await scanPage(page, found);
    await saveScreenshot(page, "journey-admin-5-welcome");

    // Signed out, the new password signs the person in again.
    await press(page, page.getByRole("button", { name: "Sign out" }));
    await page.waitForURL(/\/sign-in/);
    await signInAsNewcomer(page, found);
    const navigation = await page
      .getByRole("navigation", { name: "Main" })
      .getByRole("link")
      .allTextContents();
    expect(navigation).toContain("Designs");
    expect(navigation).not.toContain("People");
    await saveScreenshot(page, "journey-admin-6-signed-in-again");
    await context.close();
  });

  it("the admin sees the new account active", async () => {
    // Already on People: following its link again reads the list afresh.
    await followLink(admin, mainLink(admin, "People"), "People", found);
    await expect
      .poll(() => peopleRow(admin))
      .toMatch(/Builder, Manager\s*Active/);
    await admin.close();
    expect(found).toEqual([]);
  });
});
