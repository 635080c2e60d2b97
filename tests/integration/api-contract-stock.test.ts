/**
 * The storeroom's operations answer as the contract says (docs/decisions/046): locations,
 * scanned codes, the movement journal and recording, lot holds, where a lot went, its
 * certificates and low-stock alerts. Each status is one the operation documents and each
 * body matches the schema documented for it.
 */
import { randomBytes } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  baseUrl,
  bearerTokenAs,
  sendWithToken,
  signInAs,
} from "../support/app-client";
import { expectConforming } from "../support/api-contract";
import {
  createPartItem,
  createWireItem,
  receive,
} from "../support/build-order-fixtures";
import { createDesign } from "../support/design-fixtures";
import {
  closeTestDatabase,
  createLocation,
  uniqueCode,
} from "../support/test-database";

let storekeeper = "";
let manager = "";
let builder = "";
let storekeeperCookie = "";
let rack = "";
let otherRack = "";
let wire: { sku: string; id: number };
let part: { sku: string; id: number };
/** A wire spool (held and released) and a batch of the part (issued to a build order). */
const spool = uniqueCode("SP");
const batch = uniqueCode("BT");

const movements = "/api/v1/stock-movements";
const lotPath = (step: string, lot: string, sku: string) =>
  `/api/v1/lots/${encodeURIComponent(lot)}/${step}?sku=${encodeURIComponent(sku)}`;

/** Expects the status, and the answer to conform to `method template`; returns its body. */
async function answered(
  response: Response,
  status: number,
  method: string,
  template: string,
): Promise<unknown> {
  expect(response.status, await response.clone().text()).toBe(status);
  return expectConforming(response, method, template);
}

beforeAll(async () => {
  storekeeper = await bearerTokenAs("storekeeper");
  manager = await bearerTokenAs("manager");
  builder = await bearerTokenAs("builder");
  storekeeperCookie = await signInAs("storekeeper");
  const buyerCookie = await signInAs("buyer");
  rack = await createLocation(uniqueCode("CR"));
  otherRack = await createLocation(uniqueCode("CR"));
  wire = await createWireItem(buyerCookie);
  part = await createPartItem(buyerCookie);
  await receive(storekeeperCookie, {
    sku: part.sku,
    lot: batch,
    location: rack,
    quantity: 10,
    unitCost: 2.5,
  });
});
afterAll(closeTestDatabase);

/** The id of the newest lot of that number, read from the journal. */
async function lotIdOf(lot: string): Promise<number> {
  const page = (await (
    await sendWithToken("GET", `${movements}?lot=${lot}`, manager)
  ).json()) as { movements: { lotId: number }[] };
  return page.movements[0]!.lotId;
}

describe("locations and scanned codes against the contract", () => {
  it("lists the locations and looks up a location's and a lot's code", async () => {
    const locations = await answered(
      await sendWithToken("GET", "/api/v1/locations", manager),
      200,
      "GET",
      "/api/v1/locations",
    );
    expect(locations).toEqual(
      expect.arrayContaining([expect.objectContaining({ code: rack })]),
    );

    const location = await answered(
      await sendWithToken("GET", `/api/v1/scan-lookup?code=B${rack}`, manager),
      200,
      "GET",
      "/api/v1/scan-lookup",
    );
    expect(location).toMatchObject({ kind: "location", code: rack });

    // Spool: 5.60 kg gross − 0.60 kg tare = 5.00 kg net.
    await answered(
      await sendWithToken("POST", movements, storekeeper, {
        type: "receipt",
        sku: wire.sku,
        lot: spool,
        location: rack,
        grossKg: 5.6,
        tareKg: 0.6,
        unitCost: 14.6,
      }),
      201,
      "POST",
      movements,
    );
    const lotId = await lotIdOf(spool);
    const lot = await answered(
      await sendWithToken("GET", `/api/v1/scan-lookup?code=L${lotId}`, manager),
      200,
      "GET",
      "/api/v1/scan-lookup",
    );
    expect(lot).toMatchObject({
      kind: "lot",
      lotId,
      sku: wire.sku,
      onHand: 5,
      location: rack,
    });
  });

  it("refuses a foreign code (400), one naming nothing (404) and no sign-in (401)", async () => {
    const lookUp = (code: string) =>
      sendWithToken("GET", `/api/v1/scan-lookup?code=${code}`, manager);
    // An EAN-13 of another company: not a Turnledger code.
    await answered(
      await lookUp("4006381333931"),
      400,
      "GET",
      "/api/v1/scan-lookup",
    );
    await answered(
      await lookUp(`B${uniqueCode("NONE")}`),
      404,
      "GET",
      "/api/v1/scan-lookup",
    );
    for (const path of ["/api/v1/locations", "/api/v1/scan-lookup"])
      await answered(await fetch(`${baseUrl()}${path}`), 401, "GET", path);
  });
});

describe("the movement journal and recording against the contract", () => {
  it("records a receipt, a transfer and a count, and pages the journal", async () => {
    const record = (body: Record<string, unknown>) =>
      sendWithToken("POST", movements, storekeeper, body);
    await answered(
      await record({
        type: "receipt",
        sku: part.sku,
        lot: batch,
        location: rack,
        quantity: 4,
        unitCost: 2.4,
        reference: "Delivery note 4471",
      }),
      201,
      "POST",
      movements,
    );
    const transfer = await answered(
      await record({
        type: "transfer",
        sku: part.sku,
        lot: batch,
        location: rack,
        toLocation: otherRack,
        quantity: 2,
      }),
      201,
      "POST",
      movements,
    );
    expect(transfer).toMatchObject({
      movement: { toLocation: otherRack, quantity: -2 },
    });
    await answered(
      await record({
        type: "count",
        sku: part.sku,
        lot: batch,
        location: otherRack,
        quantity: 1,
      }),
      201,
      "POST",
      movements,
    );

    const page = await answered(
      await sendWithToken(
        "GET",
        `${movements}?sku=${part.sku}&pageSize=2`,
        manager,
      ),
      200,
      "GET",
      movements,
    );
    expect(page).toMatchObject({
      page: 1,
      pageSize: 2,
      hasMore: true,
      movements: [
        { type: "count", countedQuantity: 1, quantity: -1, lot: batch },
        { type: "transfer" },
      ],
    });
  });

  it("refuses a bad body or query (400), a role (403), too little stock (409), no sign-in (401)", async () => {
    const issue = (token: string, body: Record<string, unknown>) =>
      sendWithToken("POST", movements, token, {
        type: "issue",
        sku: part.sku,
        lot: batch,
        location: rack,
        quantity: 1,
        ...body,
      });
    const refusals: [Response, number][] = [
      [await issue(storekeeper, { quantity: undefined }), 400],
      [await issue(storekeeper, { sku: uniqueCode("NO-SUCH") }), 400],
      [await issue(manager, {}), 403],
      [await issue(storekeeper, { quantity: 10_000 }), 409],
    ];
    for (const [response, status] of refusals)
      await answered(response, status, "POST", movements);

    await answered(
      await sendWithToken("GET", `${movements}?type=borrowed`, manager),
      400,
      "GET",
      movements,
    );
    await answered(
      await fetch(`${baseUrl()}${movements}`),
      401,
      "GET",
      movements,
    );
  });
});

describe("lots against the contract", () => {
  it("issues a lot to a build order, then shows where it went and its certificates", async () => {
    const design = await createDesign([
      { kind: "part", itemId: part.id, quantityPerMotor: "2" },
    ]);
    // Making the order is the build-order group's operation: only its id is needed here.
    const order = await sendWithToken("POST", "/api/v1/build-orders", builder, {
      designId: design.designId,
      revision: design.revision,
      quantity: 2,
    });
    expect(order.status, await order.clone().text()).toBe(201);
    const orderId = ((await order.json()) as { id: number }).id;
    const reserved = await sendWithToken(
      "POST",
      `/api/v1/build-orders/${orderId}/reserve`,
      builder,
      {},
    );
    expect(reserved.status, await reserved.clone().text()).toBe(200);

    const issue = (buildOrderId: number) =>
      sendWithToken("POST", movements, storekeeper, {
        type: "issue",
        sku: part.sku,
        lot: batch,
        location: rack,
        quantity: 2,
        buildOrderId,
      });
    expect(
      await answered(await issue(orderId), 201, "POST", movements),
    ).toMatchObject({
      movement: { lot: batch, quantity: -2 },
      buildOrder: { id: orderId, line: { required: 4, issued: 2 } },
    });
    await answered(await issue(2_147_483_000), 404, "POST", movements);

    const whereUsed = await answered(
      await sendWithToken(
        "GET",
        lotPath("where-used", batch, part.sku),
        manager,
      ),
      200,
      "GET",
      "/api/v1/lots/{lot}/where-used",
    );
    expect(whereUsed).toMatchObject({
      lot: { number: batch, sku: part.sku },
      uses: [{ buildOrderId: orderId, issued: 2, returned: 0, net: 2 }],
      otherIssues: { count: 0 },
    });

    await uploadCertificate(await lotIdOf(batch));
    const documents = await answered(
      await sendWithToken(
        "GET",
        lotPath("documents", batch, part.sku),
        manager,
      ),
      200,
      "GET",
      "/api/v1/lots/{lot}/documents",
    );
    expect(documents).toMatchObject({
      documents: [
        {
          fileName: "mill-certificate.pdf",
          title: "Mill test certificate",
          contentType: "application/pdf",
        },
      ],
    });
  });

  it("holds and releases a lot, refusing as documented", async () => {
    const hold = "/api/v1/lots/{lot}/hold";
    const release = "/api/v1/lots/{lot}/release";
    const step = (name: string, token: string, body?: unknown) =>
      sendWithToken("POST", lotPath(name, spool, wire.sku), token, body);

    const held = await answered(
      await step("hold", storekeeper, {
        reason: "Enamel cracks on the outer turns.",
      }),
      200,
      "POST",
      hold,
    );
    expect(held).toMatchObject({ held: true, number: spool });
    await answered(
      await step("hold", storekeeper, { reason: "Twice." }),
      409,
      "POST",
      hold,
    );
    await answered(
      await step("hold", storekeeper, { reason: " " }),
      400,
      "POST",
      hold,
    );
    await answered(await step("release", manager), 403, "POST", release);
    // Without a body: a release may leave out why.
    const released = await answered(
      await step("release", storekeeper),
      200,
      "POST",
      release,
    );
    expect(released).toMatchObject({
      held: false,
      holdReason: null,
      heldBy: null,
    });
    await answered(
      await step("release", storekeeper, { reason: "Checked." }),
      409,
      "POST",
      release,
    );
  });

  it("answers 404 for no such lot, 409 for a number several items share without sku, 400 for a bad sku", async () => {
    const shared = uniqueCode("SH");
    for (const sku of [wire.sku, part.sku])
      await receive(storekeeperCookie, {
        sku,
        lot: shared,
        location: rack,
        quantity: 1,
        unitCost: 1,
      });
    for (const [method, step] of [
      ["GET", "where-used"],
      ["GET", "documents"],
      ["POST", "hold"],
      ["POST", "release"],
    ] as const) {
      const template = `/api/v1/lots/{lot}/${step}`;
      const body = method === "POST" ? { reason: "Checking." } : undefined;
      const send = (path: string) =>
        sendWithToken(method, path, storekeeper, body);
      await answered(
        await send(lotPath(step, uniqueCode("NOLOT"), wire.sku)),
        404,
        method,
        template,
      );
      await answered(
        await send(`/api/v1/lots/${shared}/${step}`),
        409,
        method,
        template,
      );
      await answered(
        await send(lotPath(step, shared, "X".repeat(41))),
        400,
        method,
        template,
      );
    }
  });
});

describe("low-stock alerts against the contract", () => {
  it("lists alerts with their total, and refuses a bad status", async () => {
    const sku = uniqueCode("CT-LOW");
    const buyer = await bearerTokenAs("buyer");
    await answered(
      await sendWithToken("POST", "/api/v1/items", buyer, {
        kind: "part",
        sku,
        name: "Contract test spacer",
        unit: "pcs",
        reorderPoint: 10,
        reorderQuantity: 40,
      }),
      201,
      "POST",
      "/api/v1/items",
    );
    // 3 pcs received against a reorder point of 10: an alert opens.
    await answered(
      await sendWithToken("POST", movements, storekeeper, {
        type: "receipt",
        sku,
        location: rack,
        quantity: 3,
        unitCost: 0.4,
      }),
      201,
      "POST",
      movements,
    );

    const open = await sendWithToken(
      "GET",
      "/api/v1/alerts?status=open&perPage=200",
      manager,
    );
    expect(Number(open.headers.get("X-Total-Count"))).toBeGreaterThan(0);
    const alerts = (await answered(open, 200, "GET", "/api/v1/alerts")) as {
      sku: string;
    }[];
    expect(alerts.map((alert) => alert.sku)).toContain(sku);

    await answered(
      await sendWithToken("GET", "/api/v1/alerts?status=all", manager),
      200,
      "GET",
      "/api/v1/alerts",
    );
    await answered(
      await sendWithToken("GET", "/api/v1/alerts?status=soon", manager),
      400,
      "GET",
      "/api/v1/alerts",
    );
  });
});

/** Adds a small PDF (its %PDF- header and %%EOF end) to the lot through its page's form, as a storekeeper does. */
async function uploadCertificate(lotId: number) {
  const bytes = new Uint8Array(1024);
  bytes.set(randomBytes(1024));
  bytes.set(new TextEncoder().encode("%PDF-1.7\n"), 0);
  bytes.set(new TextEncoder().encode("\n%%EOF\n"), 1024 - 7);
  const form = new FormData();
  form.append("title", "Mill test certificate");
  form.append(
    "file",
    new Blob([bytes], { type: "application/pdf" }),
    "mill-certificate.pdf",
  );
  const response = await fetch(`${baseUrl()}/stock/lots/${lotId}`, {
    method: "POST",
    redirect: "manual",
    headers: { Cookie: storekeeperCookie, Origin: baseUrl() },
    body: form,
  });
  expect(response.status, await response.text()).toBe(302);
}
