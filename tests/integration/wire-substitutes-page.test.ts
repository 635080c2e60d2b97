/**
 * The design page's "Substitutes from stock" (issue 19) as a browser without JavaScript
 * sends and reads it: the panel open with a sentence when the line's wire is short for an
 * open build order, the tolerance field's message, and "Use this" refusing (nothing
 * written) or applying with a one-time message on the new draft revision.
 */
import { count, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { designRevisions } from "~/db/schema";
import {
  followRedirect,
  get,
  postForm,
  sendJson,
  signInAs,
} from "../support/app-client";
import { readable } from "../support/page-text";
import { createSubstituteScene } from "../support/substitute-fixtures";
import { closeTestDatabase, testDb } from "../support/test-database";

let builder = "";
let manager = "";
let scene: Awaited<ReturnType<typeof createSubstituteScene>>;
const page = (revision = 1, query = "") =>
  `/designs/${scene.design.designId}/revisions/${revision}${query}`;

async function revisionCount() {
  const [row] = await testDb()
    .select({ revisions: count() })
    .from(designRevisions)
    .where(eq(designRevisions.designId, scene.design.designId));
  return row!.revisions;
}

beforeAll(async () => {
  builder = await signInAs("builder");
  manager = await signInAs("manager");
  scene = await createSubstituteScene();
  // 200 motors need about 200 × 44.7 g = 8.9 kg of the 1.00 mm wire; 5 kg is on hand.
  const order = await sendJson(
    "POST",
    "/api/v1/build-orders",
    {
      designId: scene.design.designId,
      revision: 1,
      quantity: 200,
    },
    builder,
  );
  expect(order.status, await order.clone().text()).toBe(201);
});
afterAll(closeTestDatabase);

/** A server-rendered page's text as read: React's text separators dropped, plain spaces. */
const shown = (html: string) => readable(html.replaceAll("<!-- -->", ""));

describe("the substitutes panel", () => {
  it("shows open, saying the wire is short, with the proposals and units; readers get no button", async () => {
    const response = await get(page(), manager);
    expect(response.status).toBe(200);
    const html = await response.text();
    const text = shown(html);
    expect(text).toContain("Substitutes from stock");
    expect(text).toContain(
      `${scene.original.sku} is short: open build orders still need`,
    );
    expect(html).toMatch(/<details[^>]*open/);
    expect(text).toContain(`2 × ${scene.twoOf071.sku}`);
    expect(text).toContain("+0.82 %");
    expect(text).toContain("3.000 kg");
    expect(text).not.toContain("Use this");
  });

  it("gives the tolerance field its message and shows the default", async () => {
    const text = shown(
      await (await get(page(1, "?tolerance=40"), builder)).text(),
    );
    expect(text).toContain("The tolerance is at most 25 %. Showing ±3 %.");
  });
});

describe("Use this", () => {
  const use = (fields: Record<string, string>) =>
    postForm(
      page(),
      { intent: "use-substitute", line: "1", tolerance: "3", ...fields },
      builder,
    );

  it("refuses bad input and a wire that is not a substitute, writing nothing", async () => {
    const before = await revisionCount();
    const bad = await use({ sku: scene.twoOf071.sku, strands: "0" });
    expect(bad.status).toBe(400);
    expect(shown(await bad.text())).toContain("At least 1 strand in hand.");
    const outOfStock = await use({ sku: scene.notInStock.sku, strands: "4" });
    expect(outOfStock.status).toBe(409);
    expect(shown(await outOfStock.text())).toContain(
      "is not among the substitutes for line 1",
    );
    expect(await revisionCount()).toBe(before);
  });

  it("starts revision 2 with the substitute and says so once", async () => {
    const before = await revisionCount();
    const response = await use({ sku: scene.twoOf071.sku, strands: "2" });
    expect(response.status).toBe(302);
    expect(response.headers.get("location")).toBe(page(2));
    expect(await revisionCount()).toBe(before + 1);
    const next = await followRedirect(response, builder);
    expect(shown(await next.text())).toContain(
      `Line 1 of revision 2 now winds 2 × ${scene.twoOf071.sku} in hand.`,
    );
  });
});
