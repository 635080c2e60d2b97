/**
 * The message a page shows after an action ("Metal base saved.") comes from a
 * short-lived cookie that names a message by its code, set by the action's
 * redirect and cleared by the next page, which shows it once. The words come
 * from the app's own table and its database: a link with `?done=`, `?saved=`,
 * `?created=` or `?added=`, or a cookie made by hand, shows nothing.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  flashCookieFrom,
  followRedirect,
  get,
  newPerson,
  postForm,
  sendJson,
  signInAs,
} from "../support/app-client";
import { createDesign } from "../support/design-fixtures";
import {
  closeTestDatabase,
  createLocation,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let buyer = "";
let storekeeper = "";
let manager = "";

beforeAll(async () => {
  buyer = await signInAs("buyer");
  storekeeper = await signInAs("storekeeper");
  manager = await signInAs("manager");
});
afterAll(closeTestDatabase);

/** Page text with React's markers between text pieces removed and no-break spaces plain. */
const readable = (html: string) =>
  html.replace(/<!-- -->/g, "").replace(/\u00a0/g, " ");

/** The Set-Cookie header for the flash cookie, whole (attributes included). */
function flashSetCookie(response: Response): string | undefined {
  return response.headers
    .getSetCookie()
    .find((header) => header.startsWith("turnledger_flash="));
}

const crafted = "Your account is locked: send your password to evil.example";

async function pageText(path: string, cookie: string): Promise<string> {
  const response = await get(path, cookie);
  expect(response.status, path).toBe(200);
  return readable(await response.text());
}

describe("a message after an action", () => {
  it("is a short-lived httpOnly cookie on the redirect, not text in the address", async () => {
    const response = await postForm(
      "/prices",
      {
        intent: "metal-base",
        conductor: "copper",
        currency: "EUR",
        pricePerKg: "8.1234",
        validFrom: "2026-02-01",
      },
      buyer,
    );
    expect(response.status).toBe(302);
    expect(response.headers.get("location")).toBe("/prices");
    const header = flashSetCookie(response);
    expect(header).toBeDefined();
    const attributes = header!.split(";").map((part) => part.trim());
    expect(attributes).toContain("HttpOnly");
    expect(attributes).toContain("Path=/");
    expect(attributes).toContain("SameSite=Lax");
    const maxAge = Number(
      attributes.find((part) => part.startsWith("Max-Age="))?.slice(8),
    );
    expect(maxAge).toBeGreaterThan(0);
    expect(maxAge).toBeLessThanOrEqual(300);
    // The cookie names the message; the words are not in it.
    expect(decodeURIComponent(header!)).not.toContain("saved");
  });

  it("is shown by the next page once, which clears the cookie in the same answer", async () => {
    const saved = await postForm(
      "/prices",
      {
        intent: "currency-rate",
        currency: "CHF",
        rate: "1.05",
        validFrom: "2026-02-01",
      },
      buyer,
    );
    expect(saved.status).toBe(302);
    const next = await followRedirect(saved, buyer);
    expect(next.status).toBe(200);
    expect(readable(await next.text())).toContain("Currency rate saved.");
    const cleared = flashSetCookie(next);
    expect(cleared).toMatch(/^turnledger_flash=;/);
    expect(cleared).toMatch(/Max-Age=0|Expires=Thu, 01 Jan 1970/);

    // Reloaded (the browser no longer sends the cleared cookie): no message.
    expect(await pageText("/prices", buyer)).not.toContain(
      "Currency rate saved.",
    );
  });

  it("names what was made from the database: the new supplier", async () => {
    const name = `Flash wire mill ${uniqueCode("F")}`;
    const response = await postForm(
      "/suppliers",
      { name, currency: "EUR" },
      buyer,
    );
    expect(response.status).toBe(302);
    expect(response.headers.get("location")).toBe("/suppliers");
    expect(decodeURIComponent(flashSetCookie(response)!)).not.toContain(
      "Flash wire mill",
    );
    const next = await followRedirect(response, manager);
    expect(readable(await next.text())).toContain(
      `Added the supplier ${name}.`,
    );
  });

  it("tells the storekeeper what was recorded, from the movement itself", async () => {
    const sku = uniqueCode("FL");
    const store = await createLocation(uniqueCode("FS"));
    const created = await sendJson(
      "POST",
      "/api/v1/items",
      {
        kind: "magnet",
        sku,
        name: "N42SH block 20 × 10 × 5",
        grade: "N42SH",
        shape: { kind: "block", lengthMm: 20, widthMm: 10, heightMm: 5 },
        coating: "NiCuNi",
        magnetisation: "through 5 mm",
      },
      buyer,
    );
    expect(created.status, await created.clone().text()).toBe(201);
    const recorded = await postForm(
      "/stock/record",
      {
        type: "receipt",
        sku,
        location: store,
        quantity: "40",
        unitCost: "1.25",
      },
      storekeeper,
    );
    expect(recorded.status, await recorded.clone().text()).toBe(302);
    // After a receipt the record page offers the new lot's label (issue 20): `received=` names the movement.
    expect(recorded.headers.get("location")).toMatch(
      new RegExp(`^/stock/record\\?type=receipt&sku=${sku}&received=\\d+$`),
    );
    const next = await followRedirect(recorded, storekeeper);
    expect(readable(await next.text())).toContain(
      `Receipt recorded: 40 pieces of ${sku} at ${store}. On hand now 40 pieces.`,
    );
  });
});

describe("a crafted link or cookie", () => {
  it("shows no text from the address on any page that used to read one", async () => {
    const [orders] = await testDatabase().query(
      "SELECT MIN(id) AS id FROM build_orders",
    );
    const orderId = (orders as { id: number }[])[0]!.id;
    const [items] = await testDatabase().query(
      "SELECT sku FROM items ORDER BY id LIMIT 1",
    );
    const sku = (items as { sku: string }[])[0]!.sku;
    const text = encodeURIComponent(crafted);
    const links: [string, string][] = [
      [`/prices?saved=metal-base`, manager],
      [`/prices?saved=currency-rate`, manager],
      [`/suppliers?created=${text}`, manager],
      [`/reference?table=magnet-grades&added=${text}`, manager],
      [`/stock/items/${encodeURIComponent(sku)}?saved=created`, manager],
      [`/stock/items/${encodeURIComponent(sku)}?saved=archive`, manager],
      [`/stock/record?done=${text}`, storekeeper],
      [`/build-orders/${orderId}?done=${text}`, manager],
      [`/build-orders/${orderId}?done=created`, manager],
    ];
    for (const [path, cookie] of links) {
      const html = await pageText(path, cookie);
      expect(html, path).not.toContain(crafted);
      expect(html, path).not.toMatch(
        /Metal base saved|Currency rate saved|Added to the catalogue|Archived: the item|Build order made|Added the (supplier|grade)/,
      );
    }
  });

  it("shows nothing when the cookie carries words or a code the app does not know", async () => {
    const forged = (value: unknown) =>
      `turnledger_flash=${encodeURIComponent(
        Buffer.from(JSON.stringify(value)).toString("base64"),
      )}`;
    const cookies = [
      forged({ code: "metal-base-saved", text: crafted }),
      forged({ code: crafted }),
      forged(crafted),
      forged({ code: "supplier-added", id: crafted }),
      forged({ code: "supplier-added", id: 999_999_999 }),
      `turnledger_flash=${encodeURIComponent(crafted)}`,
    ];
    for (const flash of cookies) {
      const response = await get("/prices", `${manager}; ${flash}`);
      expect(response.status).toBe(200);
      const html = readable(await response.text());
      expect(html, flash).not.toContain(crafted);
      expect(html, flash).not.toContain("Added the supplier");
      // Whatever it held, it is cleared.
      expect(flashSetCookie(response), flash).toMatch(/^turnledger_flash=;/);
    }
    // A genuine code shows the table's words, and only those.
    const genuine = await get(
      "/prices",
      `${manager}; ${forged({ code: "metal-base-saved" })}`,
    );
    expect(readable(await genuine.text())).toContain("Metal base saved.");
  });

  it("is not needed by the redirect: the cookie goes to the next page whatever it is", async () => {
    const response = await postForm(
      "/prices",
      {
        intent: "metal-base",
        conductor: "aluminium",
        currency: "EUR",
        pricePerKg: "2.5",
        validFrom: "2026-02-01",
      },
      buyer,
    );
    const flash = flashCookieFrom(response);
    expect(flash).toMatch(/^turnledger_flash=/);
    // Carried to another page, the message is shown there once and cleared.
    const elsewhere = await get("/stock", `${buyer}; ${flash}`);
    expect(readable(await elsewhere.text())).toContain("Metal base saved.");
    expect(flashSetCookie(elsewhere)).toMatch(/^turnledger_flash=;/);
  });

  it("names the person an admin's change was about, from the database, on the person's page", async () => {
    const admin = await signInAs("admin");
    const person = await newPerson(
      "storekeeper",
      `Flash Person ${uniqueCode("P")}`,
    );
    const response = await postForm(
      `/admin/people/${person.id}`,
      { intent: "deactivate" },
      admin,
    );
    expect(response.status).toBe(302);
    expect(response.headers.get("location")).toBe(`/admin/people/${person.id}`);
    expect(decodeURIComponent(flashSetCookie(response)!)).not.toContain(
      "Flash Person",
    );
    // The same note in anyone else's browser names nobody.
    const note = flashCookieFrom(response);
    const elsewhere = await get("/stock", `${storekeeper}; ${note}`);
    const elsewhereText = readable(await elsewhere.text());
    expect(elsewhereText).not.toContain(person.name);
    expect(elsewhereText).not.toContain(person.email);
    expect(elsewhereText).not.toContain("is deactivated");

    const next = await followRedirect(response, admin);
    expect(readable(await next.text())).toContain(
      `${person.name} is deactivated, signed out everywhere, and their API tokens are revoked.`,
    );
  });

  it("comes with a fetcher's answer too (no redirect), for the shell's next load to show once", async () => {
    const builder = await signInAs("builder");
    const design = await createDesign([], { status: "draft" });
    const path = `/designs/${design.designId}/revisions/${design.revision}`;
    const saved = await postForm(
      path,
      {
        intent: "fields",
        poles: "14",
        slots: "12",
        ratedCurrentA: "10",
        torqueBasis: "estimated",
        insulationClassC: "155",
      },
      builder,
    );
    expect(saved.status).toBe(200);
    const flash = flashCookieFrom(saved);
    expect(flash).toMatch(/^turnledger_flash=/);
    const next = await get(path, `${builder}; ${flash}`);
    expect(readable(await next.text())).toContain("Motor figures saved.");
    expect(flashSetCookie(next)).toMatch(/^turnledger_flash=;/);
    expect(await pageText(path, builder)).not.toContain("Motor figures saved.");

    // A refused change leaves no message.
    const refused = await postForm(
      path,
      { intent: "fields", poles: "", slots: "12" },
      builder,
    );
    expect(refused.status).toBe(400);
    expect(flashCookieFrom(refused)).toBeNull();
  });
});
