/**
 * Labels and scanning over HTTP: the scan lookup API for every role (a lot, a location, its
 * own address, an unknown code, foreign codes), where /scan/:code leads, and the label pages
 * (the lot's figures and QR address, the magnet caution, a delivery's labels, bad addresses
 * refused with 400, people who may not print refused with 403).
 */
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { lots } from "~/db/schema";
import { roles } from "~/lib/roles";
import {
  baseUrl,
  get,
  newPerson,
  sendJson,
  signIn,
  signInAs,
} from "../support/app-client";
import {
  createMagnetItem,
  createWireItem,
  receive,
} from "../support/build-order-fixtures";
import {
  addRates,
  createOrder,
  createOrderSupplier,
  uniqueCurrency,
} from "../support/purchase-order-fixtures";
import {
  closeTestDatabase,
  createLocation,
  testDb,
  uniqueCode,
} from "../support/test-database";

let buyer = "";
let storekeeper = "";
let storekeeperId = "";
let manager = "";
let rack = "";
let shelf = "";
let wire = { id: 0, sku: "" };
let magnet = { id: 0, sku: "" };
const spoolLot = uniqueCode("SP");
const magnetLot = uniqueCode("MB");
let spoolLotId = 0;
let magnetLotId = 0;

async function lotIdOf(itemId: number, lotNumber: string): Promise<number> {
  const [row] = await testDb()
    .select({ id: lots.id })
    .from(lots)
    .where(eq(lots.lotNumber, lotNumber));
  expect(row, `lot ${lotNumber} of item ${itemId}`).toBeDefined();
  return row!.id;
}

const readable = (html: string) =>
  html.replace(/<!-- -->/g, "").replace(/\u00a0/g, " ");

async function lookUp(code: string, cookie = storekeeper) {
  const response = await get(
    `/api/v1/scan-lookup?${new URLSearchParams({ code })}`,
    cookie,
  );
  return { status: response.status, body: (await response.json()) as never };
}

beforeAll(async () => {
  buyer = await signInAs("buyer");
  const person = await newPerson("storekeeper");
  storekeeperId = person.id;
  storekeeper = await signIn(person.email, person.password);
  manager = await signInAs("manager");
  rack = await createLocation(uniqueCode("LBL"), "Label test rack");
  shelf = await createLocation(uniqueCode("LBS"), "Label test shelf");
  wire = await createWireItem(buyer);
  magnet = await createMagnetItem(buyer);
  await receive(storekeeper, {
    sku: wire.sku,
    lot: spoolLot,
    location: rack,
    grossKg: 5.4,
    tareKg: 0.6,
    unitCost: 14.2,
    supplierBatch: "HEAT-7731",
  });
  await receive(storekeeper, {
    sku: magnet.sku,
    lot: magnetLot,
    location: rack,
    quantity: 200,
    unitCost: 0.85,
  });
  // 50 of the 200 pieces moved to the shelf: the batch is in two places.
  const transfer = await sendJson(
    "POST",
    "/api/v1/stock-movements",
    {
      type: "transfer",
      sku: magnet.sku,
      lot: magnetLot,
      location: rack,
      toLocation: shelf,
      quantity: 50,
    },
    storekeeper,
  );
  expect(transfer.status, await transfer.clone().text()).toBe(201);
  spoolLotId = await lotIdOf(wire.id, spoolLot);
  magnetLotId = await lotIdOf(magnet.id, magnetLot);
});
afterAll(closeTestDatabase);

describe("GET /api/v1/scan-lookup", () => {
  it("answers every role with the lot, its item and its one location", async () => {
    for (const role of roles) {
      const cookie = await signInAs(role);
      const { status, body } = await lookUp(`L${spoolLotId}`, cookie);
      expect(status, role).toBe(200);
      expect(body).toMatchObject({
        kind: "lot",
        code: `L${spoolLotId}`,
        lotId: spoolLotId,
        sku: wire.sku,
        lot: spoolLot,
        unit: "kg",
        // Worked by hand: gross 5.4 kg − tare 0.6 kg = 4.8 kg net.
        onHand: 4.8,
        location: rack,
        locations: [rack],
      });
    }
  });

  it("reads the QR's whole address, lower case and a space after the letter", async () => {
    for (const code of [
      `${baseUrl()}/scan/L${spoolLotId}`,
      `/scan/L${spoolLotId}`,
      `l${spoolLotId}`,
      ` L ${spoolLotId} `,
    ]) {
      const { status, body } = await lookUp(code);
      expect(status, code).toBe(200);
      expect(body).toMatchObject({ kind: "lot", lotId: spoolLotId });
    }
  });

  it("gives no single location for a lot kept in two places, and names both", async () => {
    const { status, body } = await lookUp(`L${magnetLotId}`);
    expect(status).toBe(200);
    expect(body).toMatchObject({
      kind: "lot",
      lot: magnetLot,
      // 200 received − 50 moved = 150 at the rack, 50 on the shelf: 200 in all.
      onHand: 200,
      location: null,
      locations: [rack, shelf].sort(),
    });
  });

  it("answers a location's code, whatever its case", async () => {
    for (const code of [`B${rack}`, `b${rack.toLowerCase()}`]) {
      const { status, body } = await lookUp(code);
      expect(status, code).toBe(200);
      expect(body).toEqual({
        kind: "location",
        code: rack,
        name: "Label test rack",
      });
    }
  });

  it("says 404 for a code of ours that names nothing", async () => {
    const lot = await lookUp("L2147483646");
    expect(lot.status).toBe(404);
    expect(lot.body).toEqual({
      error: { message: "Unknown code L2147483646: there is no such lot." },
    });
    const bin = await lookUp("BNO-SUCH-BIN-Q");
    expect(bin.status).toBe(404);
    expect(bin.body).toEqual({
      error: {
        message:
          "Unknown code BNO-SUCH-BIN-Q: there is no location NO-SUCH-BIN-Q.",
      },
    });
  });

  it("says 400 for foreign codes: a GS1 number, another host's address, nothing", async () => {
    for (const code of [
      "4006381333931",
      "(01)09501234567893(10)ABC",
      "https://elsewhere.example.net/scan/L1",
      "",
      "X-12345",
    ]) {
      const { status, body } = await lookUp(code);
      expect(status, code).toBe(400);
      expect((body as { error: { message: string } }).error.message).toMatch(
        /not a Turnledger code|another address|Nothing was scanned/,
      );
    }
  });

  it("refuses anyone not signed in with 401 and other methods with 405", async () => {
    expect((await get(`/api/v1/scan-lookup?code=L${spoolLotId}`)).status).toBe(
      401,
    );
    const post = await sendJson("POST", "/api/v1/scan-lookup", {}, manager);
    expect(post.status).toBe(405);
  });
});

describe("GET /scan/:code", () => {
  it("sends a lot's code to the lot's page", async () => {
    const response = await get(`/scan/L${spoolLotId}`, manager);
    expect(response.status).toBe(302);
    expect(response.headers.get("location")).toBe(`/stock/lots/${spoolLotId}`);
  });

  it("sends a location's code to the record page for storekeepers, the stock list for others", async () => {
    const kept = await get(`/scan/B${rack}`, storekeeper);
    expect(kept.status).toBe(302);
    expect(kept.headers.get("location")).toBe(`/stock/record?location=${rack}`);
    const read = await get(`/scan/B${rack}`, manager);
    expect(read.headers.get("location")).toBe("/stock");
  });

  it("shows a 404 page saying why for unknown and foreign codes", async () => {
    const unknown = await get("/scan/L2147483646", manager);
    expect(unknown.status).toBe(404);
    expect(readable(await unknown.text())).toContain(
      "Unknown code L2147483646: there is no such lot.",
    );
    const foreign = await get("/scan/4006381333931", manager);
    expect(foreign.status).toBe(404);
    expect(readable(await foreign.text())).toContain(
      "This is not a Turnledger code.",
    );
  });
});

describe("label pages", () => {
  it("prints a spool's label: item, lot, supplier batch, net on hand, received day, tare and the QR's address", async () => {
    const response = await get(`/labels/lots/${spoolLotId}`, storekeeper);
    expect(response.status).toBe(200);
    const html = readable(await response.text());
    expect(html).toContain(wire.sku);
    expect(html).toContain("Enamelled copper 0.80 mm grade 2");
    expect(html).toContain(spoolLot);
    expect(html).toContain("HEAT-7731");
    expect(html).toMatch(/Net on hand<\/dt><dd[^>]*>4\.800 kg</);
    expect(html).toMatch(/Tare<\/dt><dd[^>]*>0\.600 kg</);
    expect(html).toContain(`data-scan-url="${baseUrl()}/scan/L${spoolLotId}"`);
    expect(html).toContain("<svg");
    expect(html).toContain("size: 62mm 100mm");
    expect(html).not.toContain("Strong magnets");
  });

  it("prints a magnet batch with its grade, pieces and the handling caution", async () => {
    const response = await get(
      `/labels/lots/${magnetLotId}?size=a4`,
      storekeeper,
    );
    expect(response.status).toBe(200);
    const html = readable(await response.text());
    expect(html).toMatch(/Grade, shape<\/dt><dd[^>]*>N42SH, block</);
    expect(html).toMatch(/Pieces<\/dt><dd[^>]*>200 pieces</);
    expect(html).toContain("Strong magnets: pinch, crush and shatter");
    // The SH suffix's working limit: 150 °C (engineering brief, makers' grade tables).
    expect(html).toContain("Not above 150 °C.");
    expect(html).toContain("size: A4");
  });

  it("prints several lots on one sheet, and a delivery's lots by its receipt", async () => {
    const sheet = await get(
      `/labels/lots?ids=${spoolLotId},${magnetLotId}`,
      storekeeper,
    );
    expect(sheet.status).toBe(200);
    const html = readable(await sheet.text());
    expect(html).toContain("Labels of 2 lots");
    expect(html.match(/data-scan-url=/g)).toHaveLength(2);

    const currency = uniqueCurrency();
    await addRates(currency, [{ validFrom: "2020-01-01", rate: "1.000000" }]);
    const order = await createOrder({
      supplierId: await createOrderSupplier(currency),
      currency,
      userId: storekeeperId,
      lines: [{ itemId: wire.id, quantity: "20.000", unitPrice: "12.5000" }],
    });
    const [first, second] = [uniqueCode("SP"), uniqueCode("SP")];
    const received = await sendJson(
      "POST",
      `/api/v1/purchase-orders/${order.id}/receipts`,
      {
        lines: [
          {
            lineId: order.lineIds[0],
            lot: first,
            location: rack,
            grossKg: 5.4,
            tareKg: 0.6,
          },
          {
            lineId: order.lineIds[0],
            lot: second,
            location: shelf,
            grossKg: 6.15,
            tareKg: 0.65,
          },
        ],
      },
      storekeeper,
    );
    expect(received.status, await received.clone().text()).toBe(201);
    const { receipt } = (await received.json()) as { receipt: { id: number } };
    const delivery = readable(
      await (
        await get(`/labels/lots?receipt=${receipt.id}`, storekeeper)
      ).text(),
    );
    expect(delivery).toContain("Labels of 2 lots");
    expect(delivery.indexOf(first)).toBeGreaterThan(-1);
    expect(delivery.indexOf(second)).toBeGreaterThan(delivery.indexOf(first));
    // Worked by hand: 6.15 − 0.65 = 5.50 kg on the second spool.
    expect(delivery).toMatch(/Net on hand<\/dt><dd[^>]*>5\.500 kg</);

    // The receive page after that delivery offers the same labels.
    const page = readable(
      await (
        await get(`/stock/receive?received=${receipt.id}`, storekeeper)
      ).text(),
    );
    expect(page).toContain("Print labels");
    expect(page).toContain(
      `href="/labels/lots?receipt=${receipt.id}&amp;size=a4"`,
    );
    expect(page).toContain(`Label of lot ${first}`);
  });

  it("prints a location's label with its code and name", async () => {
    const response = await get(`/labels/locations/${rack}`, storekeeper);
    expect(response.status).toBe(200);
    const html = readable(await response.text());
    expect(html).toContain("Label test rack");
    expect(html).toContain(`data-scan-url="${baseUrl()}/scan/B${rack}"`);
    const sheet = await get(
      `/labels/locations?codes=${rack},${shelf}`,
      storekeeper,
    );
    expect(readable(await sheet.text())).toContain("Labels of 2 locations");
  });

  it("refuses a bad size or list with 400, what is not there with 404, those who may not print with 403", async () => {
    const cases: [string, number][] = [
      [`/labels/lots/${spoolLotId}?size=letter`, 400],
      ["/labels/lots?ids=1,x", 400],
      ["/labels/lots", 400],
      ["/labels/lots?receipt=abc", 400],
      ["/labels/lots?receipt=2147483647", 404],
      ["/labels/lots/abc", 404],
      ["/labels/locations?codes=", 400],
    ];
    for (const [path, status] of cases)
      expect((await get(path, storekeeper)).status, path).toBe(status);
    expect((await get(`/labels/lots/${spoolLotId}`, manager)).status).toBe(403);
    expect((await get(`/labels/lots/${spoolLotId}`, buyer)).status).toBe(403);
  });
});
