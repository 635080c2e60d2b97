/**
 * A page inside the app shell that refuses (403) or finds nothing (404) shows its error
 * under the shell's header and menu, with the same heading and words as before; an
 * address outside the shell shows the plain error page.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { get, signIn, uniqueEmail } from "../support/app-client";
import { closeTestDatabase, createPerson } from "../support/test-database";

const password = "Error-pages-in-shell-7";
let builder = "";

/** Page text with React's markers between text pieces removed. */
const readable = (html: string) =>
  html.replace(/<!-- -->/g, "").replace(/\u00a0/g, " ");

beforeAll(async () => {
  const email = uniqueEmail("shell-errors");
  await createPerson({
    email,
    password,
    roles: ["builder"],
    name: "Shell Errors Builder",
  });
  builder = await signIn(email, password);
});
afterAll(closeTestDatabase);

async function page(path: string, status: number): Promise<string> {
  const response = await get(path, builder);
  expect(response.status, path).toBe(status);
  expect(response.headers.get("content-type")).toContain("text/html");
  return readable(await response.text());
}

function expectShell(html: string) {
  expect(html).toContain('aria-label="Main"');
  expect(html).toMatch(/href="\/build-orders"[^>]*>Build orders</);
  expect(html).toContain("Shell Errors Builder");
  expect(html).toContain("Sign out");
}

describe("an error inside the app shell", () => {
  it("shows a missing build order under the header and menu", async () => {
    const html = await page("/build-orders/2147483647", 404);
    expectShell(html);
    expect(html).toContain("Error 404");
    expect(html).toContain("Page not found");
    expect(html).toContain("No build order BO-2147483647.");
    expect(html).toContain("Back to the start page");
    // One main landmark: the shell's.
    expect(html.match(/<main\b/g)).toHaveLength(1);
  });

  it("shows an order address that is no number the same way", async () => {
    const html = await page("/build-orders/twelve", 404);
    expectShell(html);
    expect(html).toContain("Page not found");
    expect(html).toContain("No build order &quot;twelve&quot;.");
  });

  it("shows a page the person's roles refuse under the header and menu", async () => {
    const html = await page("/admin/people", 403);
    expectShell(html);
    expect(html).toContain("Error 403");
    expect(html).toContain("Not allowed");
  });
});

describe("an error outside the app shell", () => {
  it("is the plain error page, without the menu", async () => {
    const html = await page("/no-such-page", 404);
    expect(html).toContain("Page not found");
    expect(html).toContain("There is nothing at this address.");
    expect(html).not.toContain('aria-label="Main"');
  });
});
