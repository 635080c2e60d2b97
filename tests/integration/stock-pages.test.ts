/**
 * The stock pages over HTTP, as a browser without JavaScript uses them: the
 * list (server-side pages, sort and filters in the address), the CSV export,
 * the item page with its reorder and catalogue forms, and the new-item form.
 */
import Papa from "papaparse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  followRedirect,
  get,
  postForm,
  sendJson,
  signInAs,
} from "../support/app-client";
import {
  closeTestDatabase,
  createLocation,
  uniqueCode,
} from "../support/test-database";

let buyer = "";
let storekeeper = "";
let builder = "";
let manager = "";
let store = "";

beforeAll(async () => {
  buyer = await signInAs("buyer");
  storekeeper = await signInAs("storekeeper");
  builder = await signInAs("builder");
  manager = await signInAs("manager");
  store = await createLocation(uniqueCode("SP"));
});
afterAll(closeTestDatabase);

/**
 * The page's HTML as text can be searched: React's markers between adjacent
 * text pieces removed, and the non-breaking space between a number and its
 * unit written as a plain space.
 */
const readable = (html: string) =>
  html.replace(/<!-- -->/g, "").replace(/\u00a0/g, " ");

async function createItem(body: Record<string, unknown>): Promise<string> {
  const response = await sendJson("POST", "/api/v1/items", body, buyer);
  expect(response.status, await response.clone().text()).toBe(201);
  return body.sku as string;
}

function createWire(
  sku: string,
  name = "Enamelled copper 0.50 mm grade 2",
  reorderPoint = 0,
) {
  return createItem({
    kind: "wire",
    sku,
    name,
    conductor: "copper",
    standard: "IEC",
    size: "0.5",
    insulation: "grade2",
    thermalClass: 180,
    enamel: "polyesterimide",
    reorderPoint,
    reorderQuantity: 10,
  });
}

function createMagnet(sku: string, name = "N42SH block 20 × 10 × 5") {
  return createItem({
    kind: "magnet",
    sku,
    name,
    grade: "N42SH",
    shape: { kind: "block", lengthMm: 20, widthMm: 10, heightMm: 5 },
    coating: "NiCuNi",
    magnetisation: "through 5 mm",
  });
}

async function move(body: Record<string, unknown>) {
  const response = await sendJson(
    "POST",
    "/api/v1/stock-movements",
    body,
    storekeeper,
  );
  expect(response.status, await response.clone().text()).toBe(201);
}

async function page(path: string, cookie = manager) {
  const response = await get(path, cookie);
  return {
    status: response.status,
    html: readable(await response.text()),
    location: response.headers.get("location"),
  };
}

/** The SKUs linked from a page, in order, that start with `prefix`. */
function linkedSkus(html: string, prefix: string): string[] {
  const pattern = new RegExp(`href="/stock/items/(${prefix}[^"?]*)"`, "g");
  return [...html.matchAll(pattern)].map((match) =>
    decodeURIComponent(match[1]!),
  );
}

async function itemJson(sku: string) {
  return (await (
    await get(`/api/v1/items/${encodeURIComponent(sku)}`, manager)
  ).json()) as {
    name: string;
    active: boolean;
    reorderPoint: number;
    reorderQuantity: number;
  };
}

describe("stock list", () => {
  const prefix = uniqueCode("PG");
  const skus = Array.from(
    { length: 55 },
    (_, index) => `${prefix}-${String(index + 1).padStart(2, "0")}`,
  );

  beforeAll(async () => {
    // 55 items: 53 wires, two magnets; names run backwards so name order differs from SKU order.
    for (const [index, sku] of skus.entries()) {
      if (index >= 53)
        await createMagnet(
          sku,
          `Magnet ${String(99 - index).padStart(2, "0")}`,
        );
      else
        await createWire(
          sku,
          `Wire ${String(99 - index).padStart(2, "0")}`,
          index === 2 ? 5 : 0,
        );
    }
    await move({
      type: "receipt",
      sku: skus[2],
      lot: "SP-1",
      location: store,
      grossKg: 5.4,
      tareKg: 0.6,
      unitCost: 14.2,
    });
    await move({
      type: "receipt",
      sku: skus[4],
      lot: "SP-2",
      location: store,
      quantity: 12,
      unitCost: 10,
    });
    await move({
      type: "receipt",
      sku: skus[54],
      location: store,
      quantity: 100,
      unitCost: 0.9,
    });
  });

  it("shows one page of 50 rows with the total, and the next page from the address", async () => {
    const first = await page(`/stock?search=${prefix}`);
    expect(first.status).toBe(200);
    expect(first.html).toContain("55 items");
    expect(linkedSkus(first.html, prefix)).toEqual(skus.slice(0, 50));
    expect(first.html).toContain("Page 1 of 2");

    const second = await page(`/stock?search=${prefix}&page=2`);
    expect(linkedSkus(second.html, prefix)).toEqual(skus.slice(50));
  });

  it("sorts by the column named in the address, both ways", async () => {
    const byName = await page(`/stock?search=${prefix}&sort=name&order=desc`);
    // "Wire 99" (the first SKU) is the greatest name.
    expect(linkedSkus(byName.html, prefix)[0]).toBe(skus[0]);
    const byNameUp = await page(`/stock?search=${prefix}&sort=name`);
    expect(linkedSkus(byNameUp.html, prefix).slice(0, 2)).toEqual([
      skus[54],
      skus[53],
    ]);

    const byOnHand = await page(
      `/stock?search=${prefix}&sort=onHand&order=desc`,
    );
    // 100 pieces, then 12 kg, then 4.8 kg (the sort compares the figures, whatever the unit).
    expect(linkedSkus(byOnHand.html, prefix).slice(0, 3)).toEqual([
      skus[54],
      skus[4],
      skus[2],
    ]);
    expect(byOnHand.html).toContain(
      'href="/stock?search=' + prefix + '&amp;sort=onHand"',
    );
  });

  it("filters by kind and by reorder point, and shows figures with their units", async () => {
    const magnets = await page(`/stock?search=${prefix}&kind=magnet`);
    expect(linkedSkus(magnets.html, prefix)).toEqual([skus[53], skus[54]]);
    expect(magnets.html).toContain("100 pieces");
    expect(magnets.html).toContain("90.00");

    // 4.8 kg available against a 5 kg reorder point.
    const below = await page(`/stock?search=${prefix}&belowReorder=1`);
    expect(linkedSkus(below.html, prefix)).toEqual([skus[2]]);
    expect(below.html).toContain("4.800 kg");
    expect(below.html).toContain("Below");
  });

  it("hides archived items unless asked", async () => {
    const archivedSku = skus[10]!;
    expect(
      (
        await sendJson(
          "PATCH",
          `/api/v1/items/${archivedSku}`,
          { active: false },
          buyer,
        )
      ).status,
    ).toBe(200);
    expect(
      linkedSkus((await page(`/stock?search=${archivedSku}`)).html, prefix),
    ).toEqual([]);
    const withArchived = await page(`/stock?search=${archivedSku}&archived=1`);
    expect(linkedSkus(withArchived.html, prefix)).toEqual([archivedSku]);
    expect(withArchived.html).toContain("(archived)");
  });

  it("leaves out values it cannot use instead of failing, and sends a page past the end to the last one", async () => {
    const odd = await page(`/stock?search=${prefix}&sort=colour&kind=spring`);
    expect(odd.status).toBe(200);
    expect(odd.html).toContain("were not understood: kind, sort");
    expect(linkedSkus(odd.html, prefix)).toHaveLength(50);

    const past = await page(`/stock?search=${prefix}&page=9`);
    expect(past.status).toBe(302);
    expect(past.location).toBe(`/stock?search=${prefix}&page=2`);
  });

  it("offers the CSV export of the same view, and the new-item link to buyers only", async () => {
    const list = await page(`/stock?search=${prefix}&kind=wire&page=2`, buyer);
    expect(list.html).toContain(
      `href="/stock/export.csv?search=${prefix}&amp;kind=wire"`,
    );
    expect(list.html).toContain('href="/stock/items/new"');
    const forManager = await page("/stock", manager);
    expect(forManager.html).not.toContain('href="/stock/items/new"');
  });

  it("exports every matching row, not one page", async () => {
    const response = await get(
      `/stock/export.csv?search=${prefix}&page=2&pageSize=5`,
      manager,
    );
    expect(response.status).toBe(200);
    const rows = Papa.parse<Record<string, string>>(await response.text(), {
      header: true,
      skipEmptyLines: true,
    }).data;
    expect(rows.map((row) => row.sku)).toEqual(
      skus.filter((sku) => sku !== skus[10]),
    );
    expect(response.headers.get("x-total-count")).toBe("54");
  });
});

describe("CSV export", () => {
  it("downloads the filtered view with units in their own column and formula text neutralised", async () => {
    const sku = uniqueCode("FX");
    await createWire(sku, '=HYPERLINK("x")');
    await move({
      type: "receipt",
      sku,
      lot: "SP-1",
      location: store,
      grossKg: 5.4,
      tareKg: 0.6,
      unitCost: 14.2,
    });

    const response = await get(`/stock/export.csv?search=${sku}`, manager);
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toBe(
      "text/csv; charset=utf-8",
    );
    const today = new Date().toISOString().slice(0, 10);
    expect(response.headers.get("content-disposition")).toBe(
      `attachment; filename="turnledger-stock-${today}.csv"`,
    );

    const bytes = new Uint8Array(await response.arrayBuffer());
    expect([...bytes.slice(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
    const text = new TextDecoder().decode(bytes);
    const [header, row] = Papa.parse<string[]>(text, {
      skipEmptyLines: true,
    }).data;
    expect(header).toContain("on hand");
    expect(header).toContain("unit");
    const cell = (name: string) => row![header!.indexOf(name)];
    expect(cell("sku")).toBe(sku);
    expect(cell("name")).toBe(`'=HYPERLINK("x")`);
    expect(cell("unit")).toBe("kg");
    expect(cell("on hand")).toBe("4.8");
    // 4.8 kg × 14.20 per kg = 68.16.
    expect(cell("value (company currency)")).toBe("68.16");
    expect(text).not.toMatch(/(^|,)=HYPERLINK/m);
  });

  it("rounds the value to the cent half away from zero on the exact amount", async () => {
    const sku = uniqueCode("FR");
    await createWire(sku);
    await move({
      type: "receipt",
      sku,
      lot: "SP-1",
      location: store,
      grossKg: 1.6,
      tareKg: 0.6,
      unitCost: 1.005,
    });

    const response = await get(`/stock/export.csv?search=${sku}`, manager);
    expect(response.status).toBe(200);
    const [row] = Papa.parse<Record<string, string>>(await response.text(), {
      header: true,
      skipEmptyLines: true,
    }).data;
    // 1 kg × 1.0050 per kg = 1.0050: half a cent, rounded up (decision 006).
    expect(row!["value (company currency)"]).toBe("1.01");
  });

  it("refuses filters it cannot read with a 400, not an error page", async () => {
    const response = await get("/stock/export.csv?kind=spring", manager);
    expect(response.status).toBe(400);
    expect(await response.text()).toContain(
      "kind must be one of wire, magnet, part.",
    );
  });
});

describe("item page", () => {
  it("shows a wire's attributes, length on hand, balances by lot, the chart and the movements", async () => {
    const sku = uniqueCode("IW");
    await createWire(sku);
    await move({
      type: "receipt",
      sku,
      lot: "SP-7",
      location: store,
      grossKg: 5.4,
      tareKg: 0.6,
      unitCost: 14.2,
    });
    await move({
      type: "issue",
      sku,
      lot: "SP-7",
      location: store,
      grossKg: 4.15,
      reference: "JOB-7",
    });

    const { status, html } = await page(`/stock/items/${sku}`);
    expect(status).toBe(200);
    expect(html).toContain("Enamelled copper 0.50 mm grade 2");
    expect(html).toContain("IEC 60317, 0.500 mm nominal");
    expect(html).toContain("IEC 60317 grade 2");
    // 0.500 mm copper: π/4 · 0.25 mm² × 8.89 g/cm³ = 1.746 g/m; 3.55 kg ÷ 1.7455 g/m = 2,034 m at most.
    expect(html).toContain("1.746 g/m");
    expect(html).toContain("up to 2,034 m");
    expect(html).toContain("An upper bound");
    expect(html).toContain("SP-7");
    expect(html).toContain("0.600 kg");
    expect(html).toContain("3.550 kg");
    expect(html).toContain("−1.250 kg");
    expect(html).toContain("JOB-7");
    expect(html).toMatch(
      /<svg[^>]*role="img"[^>]*aria-label="On hand over the last 2 movements/,
    );
    expect(html).toContain("reorder point");
  });

  it("shows a magnet's mass per piece and the handling caution", async () => {
    const sku = uniqueCode("IM");
    await createMagnet(sku);
    await move({
      type: "receipt",
      sku,
      location: store,
      quantity: 100,
      unitCost: 0.9,
    });
    const { html } = await page(`/stock/items/${sku}`);
    // 20 × 10 × 5 mm = 1,000 mm³ at 7.5 g/cm³ (NdFeB) = 7.50 g; 100 pieces = 750 g.
    expect(html).toContain("7.50 g");
    expect(html).toContain("750 g");
    expect(html).toContain("pacemakers");
  });

  it("pages the movement history from the address", async () => {
    const sku = uniqueCode("IP");
    await createMagnet(sku);
    for (let index = 0; index < 21; index += 1) {
      await move({
        type: "receipt",
        sku,
        location: store,
        quantity: 1,
        unitCost: 1,
        reference: `R-${index + 1}`,
      });
    }
    const first = await page(`/stock/items/${sku}`);
    expect(first.html).toContain("Page 1 of 2");
    expect(first.html).toContain("R-21");
    expect(first.html).not.toContain("R-1<");
    const second = await page(`/stock/items/${sku}?page=2`);
    expect(second.html).toContain("Page 2 of 2");
    expect(second.html).toContain("R-1<");
    expect(second.html).not.toContain("R-21");
  });

  it("opens items whose SKU holds a slash, linked with it escaped", async () => {
    const sku = `${uniqueCode("CU")}/050`;
    await createWire(sku);
    const list = await page(`/stock?search=${encodeURIComponent(sku)}`);
    expect(list.html).toContain(
      `href="/stock/items/${encodeURIComponent(sku)}"`,
    );
    const item = await page(`/stock/items/${encodeURIComponent(sku)}`);
    expect(item.status).toBe(200);
    expect(item.html).toContain(
      `SKU <span class="text-graphite-900">${sku}</span>`,
    );
    const saved = await postForm(
      `/stock/items/${encodeURIComponent(sku)}`,
      { intent: "reorder", reorderPoint: "1", reorderQuantity: "4" },
      buyer,
    );
    expect(saved.headers.get("location")).toBe(
      `/stock/items/${encodeURIComponent(sku)}`,
    );
    expect(await itemJson(sku)).toMatchObject({
      reorderPoint: 1,
      reorderQuantity: 4,
    });
  });

  it("answers 404 with a page for an unknown SKU", async () => {
    const { status, html } = await page("/stock/items/NOPE-404");
    expect(status).toBe(404);
    expect(html).toContain(
      "No item with SKU &quot;NOPE-404&quot; is in the catalogue.",
    );
  });

  it("lets storekeepers set the reorder point but not rename; builders neither", async () => {
    const sku = uniqueCode("RO");
    await createWire(sku);

    const saved = await postForm(
      `/stock/items/${sku}`,
      { intent: "reorder", reorderPoint: "3.5", reorderQuantity: "12" },
      storekeeper,
    );
    expect(saved.status).toBe(302);
    expect(saved.headers.get("location")).toBe(`/stock/items/${sku}`);
    expect(await (await followRedirect(saved, storekeeper)).text()).toContain(
      "Reorder point and quantity saved.",
    );
    expect(await itemJson(sku)).toMatchObject({
      reorderPoint: 3.5,
      reorderQuantity: 12,
    });

    const rename = await postForm(
      `/stock/items/${sku}`,
      { intent: "rename", name: "Renamed by the store" },
      storekeeper,
    );
    expect(rename.status).toBe(403);
    const archive = await postForm(
      `/stock/items/${sku}`,
      { intent: "archive" },
      storekeeper,
    );
    expect(archive.status).toBe(403);

    const byBuilder = await postForm(
      `/stock/items/${sku}`,
      { intent: "reorder", reorderPoint: "1", reorderQuantity: "1" },
      builder,
    );
    expect(byBuilder.status).toBe(403);
    expect(await itemJson(sku)).toMatchObject({
      name: "Enamelled copper 0.50 mm grade 2",
      active: true,
      reorderPoint: 3.5,
    });
  });

  it("answers bad reorder input with field messages and keeps what was typed", async () => {
    const sku = uniqueCode("RB");
    await createWire(sku);
    const response = await postForm(
      `/stock/items/${sku}`,
      { intent: "reorder", reorderPoint: "lots", reorderQuantity: "1.2345" },
      buyer,
    );
    expect(response.status).toBe(400);
    const html = readable(await response.text());
    expect(html).toContain("The reorder point must be a number.");
    expect(html).toContain("The reorder quantity has at most 3 decimals.");
    expect(html).toContain('value="lots"');

    const magnet = uniqueCode("RM");
    await createMagnet(magnet);
    const halfPiece = await postForm(
      `/stock/items/${magnet}`,
      { intent: "reorder", reorderPoint: "2.5", reorderQuantity: "10" },
      buyer,
    );
    expect(halfPiece.status).toBe(400);
    expect(await halfPiece.text()).toContain("is counted in whole pieces.");
  });

  it("lets buyers rename, archive and restore", async () => {
    const sku = uniqueCode("RN");
    await createWire(sku);
    const emptyName = await postForm(
      `/stock/items/${sku}`,
      { intent: "rename", name: " " },
      buyer,
    );
    expect(emptyName.status).toBe(400);
    expect(await emptyName.text()).toContain("Give the name.");

    expect(
      (
        await postForm(
          `/stock/items/${sku}`,
          { intent: "rename", name: "Copper 0.50 mm, class 180" },
          buyer,
        )
      ).status,
    ).toBe(302);
    expect(
      (await postForm(`/stock/items/${sku}`, { intent: "archive" }, buyer))
        .status,
    ).toBe(302);
    expect(await itemJson(sku)).toMatchObject({
      name: "Copper 0.50 mm, class 180",
      active: false,
    });
    const archived = await page(`/stock/items/${sku}`, buyer);
    expect(archived.html).toContain("Restore item");
    expect(
      (await postForm(`/stock/items/${sku}`, { intent: "restore" }, buyer))
        .status,
    ).toBe(302);
    expect((await itemJson(sku)).active).toBe(true);
  });
});

describe("new-item form", () => {
  const wireFields = (sku: string) => ({
    kind: "wire",
    sku,
    name: "Copper AWG 4/0 heavy",
    conductor: "copper",
    standard: "AWG",
    size: "0000",
    insulation: "heavy",
    thermalClass: "200",
    enamel: "polyamide-imide-overcoat",
    reorderPoint: "2",
    reorderQuantity: "20",
  });

  it("creates a wire item and sends the buyer to its page", async () => {
    const sku = uniqueCode("NW");
    const response = await postForm("/stock/items/new", wireFields(sku), buyer);
    expect(response.status).toBe(302);
    expect(response.headers.get("location")).toBe(`/stock/items/${sku}`);
    const next = await followRedirect(response, buyer);
    expect(next.status).toBe(200);
    const html = await next.text();
    expect(html).toContain("Added to the catalogue.");
    expect(html).toContain("AWG 0000");
    expect(html).toContain("Heavy build");
  });

  it("creates a magnet item from the shape fields", async () => {
    const sku = uniqueCode("NM");
    const response = await postForm(
      "/stock/items/new",
      {
        kind: "magnet",
        sku,
        name: "N42SH disc",
        grade: "N42SH",
        "shape.kind": "disc",
        "shape.diameterMm": "10",
        "shape.thicknessMm": "2",
        coating: "NiCuNi",
        magnetisation: "axial",
        reorderPoint: "50",
      },
      buyer,
    );
    expect(response.status).toBe(302);
    const { html } = await page(`/stock/items/${sku}`);
    // π/4 · 10² · 2 = 157.08 mm³ at 7.5 g/cm³ = 1.18 g.
    expect(html).toContain("diameter 10 mm × thickness 2 mm");
    expect(html).toContain("1.18 g");
  });

  it("answers a SKU already in use with 409 at the SKU field, keeping the other fields", async () => {
    const sku = uniqueCode("ND");
    await createWire(sku);
    const response = await postForm("/stock/items/new", wireFields(sku), buyer);
    expect(response.status).toBe(409);
    const html = readable(await response.text());
    expect(html).toContain(`SKU ${sku} is already in the catalogue.`);
    expect(html).toContain('value="Copper AWG 4/0 heavy"');
  });

  it("answers an unknown size or grade with 400 at its field", async () => {
    const size = await postForm(
      "/stock/items/new",
      { ...wireFields(uniqueCode("NS")), size: "99" },
      buyer,
    );
    expect(size.status).toBe(400);
    expect(await size.text()).toContain("AWG 99 is not a size from 4/0 to 46.");

    const grade = await postForm(
      "/stock/items/new",
      {
        kind: "magnet",
        sku: uniqueCode("NG"),
        name: "Mystery magnet",
        grade: "N99XX",
        "shape.kind": "block",
        "shape.lengthMm": "10",
        "shape.widthMm": "10",
        "shape.heightMm": "2",
        coating: "none",
        magnetisation: "through 2 mm",
      },
      buyer,
    );
    expect(grade.status).toBe(400);
    expect(await grade.text()).toContain(
      "Unknown magnet grade &quot;N99XX&quot;.",
    );
  });

  it("answers missing and impossible fields with messages per field", async () => {
    const empty = await postForm(
      "/stock/items/new",
      { kind: "wire", sku: "bad sku!", name: "" },
      buyer,
    );
    expect(empty.status).toBe(400);
    const html = readable(await empty.text());
    expect(html).toContain("A SKU uses letters, digits and . _ / - only.");
    expect(html).toContain("Give the name.");
    expect(html).toContain("Choose the size.");

    const ring = await postForm(
      "/stock/items/new",
      {
        kind: "magnet",
        sku: uniqueCode("NR"),
        name: "Impossible ring",
        grade: "N42SH",
        "shape.kind": "ring",
        "shape.outerDiameterMm": "10",
        "shape.innerDiameterMm": "12",
        "shape.thicknessMm": "3",
        coating: "NiCuNi",
        magnetisation: "axial",
      },
      buyer,
    );
    expect(ring.status).toBe(400);
    expect(await ring.text()).toContain(
      "The inner diameter must be smaller than the outer diameter.",
    );
  });

  it("is for buyers and admins only", async () => {
    expect((await get("/stock/items/new", storekeeper)).status).toBe(403);
    const response = await postForm(
      "/stock/items/new",
      wireFields(uniqueCode("NX")),
      builder,
    );
    expect(response.status).toBe(403);
  });
});
