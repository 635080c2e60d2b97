/**
 * The Purchasing operations answer as the contract says (docs/decisions/046): suppliers,
 * price-list uploads (layout, check, commit, the progress stream) and purchase orders
 * with their steps and receipts. Each status is one the operation documents and each
 * body matches its documented schema; the streamed answer's lines match the documented
 * event and its result the plain answer of the same status.
 */
import { Ajv2020 } from "ajv/dist/2020.js";
import addFormats from "ajv-formats";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { apiDocument } from "~/api-contract/document";
import { suppliers } from "~/db/schema";
import { progressStreamType } from "~/lib/progress-stream";
import {
  baseUrl,
  bearerTokenAs,
  newPerson,
  sendWithToken,
  signInAs,
} from "../support/app-client";
import {
  contractProblems,
  documentedOperation,
  expectConforming,
} from "../support/api-contract";
import { createPartItem } from "../support/build-order-fixtures";
import {
  createSupplier,
  partPriceList,
  partPriceListMapping as mapping,
} from "../support/price-list-fixtures";
import {
  createOrder,
  createOrderSupplier,
} from "../support/purchase-order-fixtures";
import { itemIdOf } from "../support/open-order-fixtures";
import {
  closeTestDatabase,
  createLocation,
  testDb,
  uniqueCode,
} from "../support/test-database";

let buyer = "";
let storekeeper = "";
let builder = "";
let buyerCookie = "";

beforeAll(async () => {
  buyer = await bearerTokenAs("buyer");
  storekeeper = await bearerTokenAs("storekeeper");
  builder = await bearerTokenAs("builder");
  buyerCookie = await signInAs("buyer");
});
afterAll(closeTestDatabase);

describe("the supplier operations against the contract", () => {
  it("creates, lists, reads and changes a supplier as documented", async () => {
    const name = uniqueCode("Contract Coil Wire");
    const created = await sendWithToken("POST", "/api/v1/suppliers", buyer, {
      name,
      currency: "EUR",
      leadTimeDays: 21,
      orderEmail: "orders@contract-wire.example.test",
    });
    expect(created.status, await created.clone().text()).toBe(201);
    const supplier = (await expectConforming(
      created,
      "POST",
      "/api/v1/suppliers",
    )) as { id: number };

    const list = await sendWithToken("GET", "/api/v1/suppliers", storekeeper);
    expect(list.status).toBe(200);
    expect(
      await expectConforming(list, "GET", "/api/v1/suppliers"),
    ).toContainEqual(expect.objectContaining({ id: supplier.id, name }));

    const one = await sendWithToken(
      "GET",
      `/api/v1/suppliers/${supplier.id}`,
      builder,
    );
    expect(one.status).toBe(200);
    expect(
      await expectConforming(one, "GET", "/api/v1/suppliers/{supplierId}"),
    ).toMatchObject({ id: supplier.id, wireTolerancePercent: 10 });

    const changed = await sendWithToken(
      "PATCH",
      `/api/v1/suppliers/${supplier.id}`,
      buyer,
      { notes: null, email: "sales@contract-wire.example.test" },
    );
    expect(changed.status).toBe(200);
    expect(
      await expectConforming(
        changed,
        "PATCH",
        "/api/v1/suppliers/{supplierId}",
      ),
    ).toMatchObject({ email: "sales@contract-wire.example.test", notes: null });
  });

  it("refuses as documented: a taken name, a bad body, a role, no such supplier, no sign-in", async () => {
    const first = uniqueCode("Contract Magnets");
    const second = uniqueCode("Contract Parts");
    await sendWithToken("POST", "/api/v1/suppliers", buyer, {
      name: first,
      currency: "EUR",
    });
    const other = await sendWithToken("POST", "/api/v1/suppliers", buyer, {
      name: second,
      currency: "EUR",
    });
    const { id } = (await other.json()) as { id: number };

    const taken = await sendWithToken("POST", "/api/v1/suppliers", buyer, {
      name: first,
      currency: "EUR",
    });
    expect(taken.status).toBe(409);
    await expectConforming(taken, "POST", "/api/v1/suppliers");

    const bad = await sendWithToken("POST", "/api/v1/suppliers", buyer, {
      name: "",
      currency: "$",
    });
    expect(bad.status).toBe(400);
    await expectConforming(bad, "POST", "/api/v1/suppliers");

    const role = await sendWithToken("POST", "/api/v1/suppliers", storekeeper, {
      name: uniqueCode("No"),
      currency: "EUR",
    });
    expect(role.status).toBe(403);
    await expectConforming(role, "POST", "/api/v1/suppliers");

    for (const missingId of ["2147483000", "abc"]) {
      const missing = await sendWithToken(
        "GET",
        `/api/v1/suppliers/${missingId}`,
        buyer,
      );
      expect(missing.status).toBe(404);
      await expectConforming(missing, "GET", "/api/v1/suppliers/{supplierId}");
      const patchMissing = await sendWithToken(
        "PATCH",
        `/api/v1/suppliers/${missingId}`,
        buyer,
        { notes: "x" },
      );
      expect(patchMissing.status).toBe(404);
      await expectConforming(
        patchMissing,
        "PATCH",
        "/api/v1/suppliers/{supplierId}",
      );
    }

    const rename = await sendWithToken(
      "PATCH",
      `/api/v1/suppliers/${id}`,
      buyer,
      { name: first },
    );
    expect(rename.status).toBe(409);
    await expectConforming(rename, "PATCH", "/api/v1/suppliers/{supplierId}");

    const empty = await sendWithToken(
      "PATCH",
      `/api/v1/suppliers/${id}`,
      buyer,
      {},
    );
    expect(empty.status).toBe(400);
    await expectConforming(empty, "PATCH", "/api/v1/suppliers/{supplierId}");

    const patchRole = await sendWithToken(
      "PATCH",
      `/api/v1/suppliers/${id}`,
      builder,
      { notes: "x" },
    );
    expect(patchRole.status).toBe(403);
    await expectConforming(
      patchRole,
      "PATCH",
      "/api/v1/suppliers/{supplierId}",
    );

    const anonymous = await fetch(`${baseUrl()}/api/v1/suppliers`);
    expect(anonymous.status).toBe(401);
    await expectConforming(anonymous, "GET", "/api/v1/suppliers");
  });
});

function upload(
  query: string,
  authorization: string,
  fields: { file?: Blob | string; supplier?: string; mapping?: string },
  accept?: string,
): Promise<Response> {
  const form = new FormData();
  if (fields.file !== undefined)
    form.set(
      "file",
      typeof fields.file === "string" ? new Blob([fields.file]) : fields.file,
      "sleeves.csv",
    );
  if (fields.supplier !== undefined) form.set("supplier", fields.supplier);
  if (fields.mapping !== undefined) form.set("mapping", fields.mapping);
  return fetch(`${baseUrl()}/api/v1/price-lists${query}`, {
    method: "POST",
    headers: {
      Authorization: authorization,
      ...(accept ? { Accept: accept } : {}),
    },
    body: form,
  });
}

/** Each line of a streamed answer checked against the documented event schema. */
function ndjsonEventProblems(text: string): {
  problems: string[];
  events: unknown[];
} {
  const documented = documentedOperation("POST", "/api/v1/price-lists")
    .responses?.["200"];
  const schema =
    documented && !("$ref" in documented)
      ? documented.content?.[progressStreamType]?.schema
      : undefined;
  if (!schema)
    return { problems: ["no x-ndjson answer documented"], events: [] };
  const ajv = new Ajv2020({ strict: false, allErrors: true });
  addFormats.default(ajv);
  const validate = ajv.compile({
    ...schema,
    components: { schemas: apiDocument().components?.schemas ?? {} },
  });
  const events = text
    .split("\n")
    .filter((line) => line.trim() !== "")
    .map((line) => JSON.parse(line) as unknown);
  const problems = events.flatMap((event, index) =>
    validate(event)
      ? []
      : [`line ${index + 1}: ${JSON.stringify(validate.errors)}`],
  );
  return { problems, events };
}

describe("the price-list upload against the contract", () => {
  let supplier = "";
  beforeAll(async () => {
    supplier = uniqueCode("Contract Sleeves");
    await createSupplier(buyerCookie, supplier);
  });

  it("reads the layout, checks, imports and sees a repeat as documented", async () => {
    const csv = partPriceList(3);
    const layout = await upload("?layout=1", buyer, { file: csv });
    expect(layout.status).toBe(200);
    expect(
      await expectConforming(layout, "POST", "/api/v1/price-lists"),
    ).toMatchObject({
      format: "csv",
      headers: expect.arrayContaining(["Art. no"]),
    });

    const fields = { file: csv, supplier, mapping: JSON.stringify(mapping) };
    const check = await upload("?dryRun=1", buyer, fields);
    expect(check.status, await check.clone().text()).toBe(200);
    expect(
      await expectConforming(check, "POST", "/api/v1/price-lists"),
    ).toMatchObject({ valid: 3, newItems: 1 });

    const imported = await upload("", buyer, fields);
    expect(imported.status, await imported.clone().text()).toBe(201);
    expect(
      await expectConforming(imported, "POST", "/api/v1/price-lists"),
    ).toMatchObject({ rows: 3, supplier });

    const again = await upload("", buyer, fields);
    expect(again.status).toBe(200);
    expect(
      await expectConforming(again, "POST", "/api/v1/price-lists"),
    ).toMatchObject({ alreadyImported: true });
  });

  it("streams progress as x-ndjson whose result is the plain answer", async () => {
    for (const [query, csv, status] of [
      ["?dryRun=1", partPriceList(12), 200],
      ["", partPriceList(12), 201],
      ["", partPriceList(4, [2]), 422],
    ] as const) {
      const streamed = await upload(
        query,
        buyer,
        { file: csv, supplier, mapping: JSON.stringify(mapping) },
        progressStreamType,
      );
      expect(streamed.status).toBe(200);
      expect(streamed.headers.get("Content-Type")).toContain(
        progressStreamType,
      );
      expect(
        contractProblems(
          "POST",
          "/api/v1/price-lists",
          200,
          streamed.headers.get("Content-Type"),
          null,
        ),
      ).toEqual([]);
      const { problems, events } = ndjsonEventProblems(await streamed.text());
      expect(problems).toEqual([]);
      const result = events.at(-1) as {
        type: string;
        status: number;
        body: unknown;
      };
      expect(result).toMatchObject({ type: "result", status });
      expect(
        events.some((event) => (event as { type: string }).type === "progress"),
      ).toBe(true);
      expect(
        contractProblems(
          "POST",
          "/api/v1/price-lists",
          result.status,
          "application/json",
          result.body,
        ),
      ).toEqual([]);
    }
  });

  it("refuses as documented: invalid rows, a bad form, no such supplier, a role, a file too large", async () => {
    const invalid = await upload("", buyer, {
      file: partPriceList(3, [1, 3]),
      supplier,
      mapping: JSON.stringify(mapping),
    });
    expect(invalid.status).toBe(422);
    expect(
      await expectConforming(invalid, "POST", "/api/v1/price-lists"),
    ).toMatchObject({ invalidCount: 2, valid: 1 });

    const badForm = await upload("?dryRun=1", buyer, {
      file: partPriceList(1),
      supplier,
      mapping: "{ not json",
    });
    expect(badForm.status).toBe(400);
    expect(
      await expectConforming(badForm, "POST", "/api/v1/price-lists"),
    ).toMatchObject({ error: { fields: { mapping: expect.any(Array) } } });

    const noSupplier = await upload("?dryRun=1", buyer, {
      file: partPriceList(1),
      supplier: uniqueCode("Nobody"),
      mapping: JSON.stringify(mapping),
    });
    expect(noSupplier.status).toBe(400);
    await expectConforming(noSupplier, "POST", "/api/v1/price-lists");

    const role = await upload("?dryRun=1", storekeeper, {
      file: partPriceList(1),
      supplier,
      mapping: JSON.stringify(mapping),
    });
    expect(role.status).toBe(403);
    await expectConforming(role, "POST", "/api/v1/price-lists");

    const huge = await upload("?dryRun=1", buyer, {
      file: new Blob([new Uint8Array(20 * 1024 * 1024 + 10).fill(65)]),
      supplier,
      mapping: JSON.stringify(mapping),
    });
    expect(huge.status).toBe(413);
    await expectConforming(huge, "POST", "/api/v1/price-lists");
  });
});

describe("the purchase-order operations against the contract", () => {
  let sku = "";
  let supplierId = 0;
  let rack = "";

  beforeAll(async () => {
    ({ sku } = await createPartItem(
      buyerCookie,
      "pcs",
      "Contract bearing 6001",
    ));
    const [row] = await testDb()
      .insert(suppliers)
      .values({
        name: uniqueCode("Contract Bearings"),
        currency: "EUR",
        leadTimeDays: 10,
        orderEmail: "orders@contract-bearings.example.test",
      })
      .$returningId();
    supplierId = row!.id;
    rack = await createLocation(uniqueCode("RK"));
  });

  const newDraft = async (forSupplier = supplierId) => {
    const response = await sendWithToken(
      "POST",
      "/api/v1/purchase-orders",
      buyer,
      {
        supplierId: forSupplier,
        notes: "Contract test",
        lines: [
          {
            sku,
            quantity: 10,
            unitPrice: 2.5,
            overrideReason: "Quoted by phone",
          },
        ],
      },
    );
    expect(response.status, await response.clone().text()).toBe(201);
    return (await expectConforming(
      response,
      "POST",
      "/api/v1/purchase-orders",
    )) as {
      id: number;
      number: string;
      lines: { id: number }[];
    };
  };

  it("creates, reads, lists, changes, sends, receives and closes an order as documented", async () => {
    const draft = await newDraft();

    const one = await sendWithToken(
      "GET",
      `/api/v1/purchase-orders/${draft.id}`,
      storekeeper,
    );
    expect(one.status).toBe(200);
    expect(
      await expectConforming(one, "GET", "/api/v1/purchase-orders/{orderId}"),
    ).toMatchObject({ status: "draft", total: 25 });

    const changed = await sendWithToken(
      "PATCH",
      `/api/v1/purchase-orders/${draft.id}`,
      buyer,
      {
        notes: "Deliver to goods-in",
        lines: [{ id: draft.lines[0]!.id, quantity: 12 }],
      },
    );
    expect(changed.status, await changed.clone().text()).toBe(200);
    expect(
      await expectConforming(
        changed,
        "PATCH",
        "/api/v1/purchase-orders/{orderId}",
      ),
    ).toMatchObject({ notes: "Deliver to goods-in" });

    const sent = await sendWithToken(
      "POST",
      `/api/v1/purchase-orders/${draft.id}/send`,
      buyer,
    );
    expect(sent.status, await sent.clone().text()).toBe(200);
    expect(
      await expectConforming(
        sent,
        "POST",
        "/api/v1/purchase-orders/{orderId}/send",
      ),
    ).toMatchObject({ status: "sent" });

    const page = await sendWithToken(
      "GET",
      `/api/v1/purchase-orders?supplierId=${supplierId}&status=sent`,
      builder,
    );
    expect(page.status).toBe(200);
    expect(
      await expectConforming(page, "GET", "/api/v1/purchase-orders"),
    ).toMatchObject({ total: 1, orders: [{ id: draft.id, lineCount: 1 }] });

    const received = await sendWithToken(
      "POST",
      `/api/v1/purchase-orders/${draft.number}/receipts`,
      storekeeper,
      { lines: [{ lineId: draft.lines[0]!.id, location: rack, quantity: 4 }] },
    );
    expect(received.status, await received.clone().text()).toBe(201);
    expect(
      await expectConforming(
        received,
        "POST",
        "/api/v1/purchase-orders/{orderId}/receipts",
      ),
    ).toMatchObject({ order: { status: "partly_received" } });

    const withReceipt = await sendWithToken(
      "GET",
      `/api/v1/purchase-orders/${draft.id}`,
      buyer,
    );
    expect(
      await expectConforming(
        withReceipt,
        "GET",
        "/api/v1/purchase-orders/{orderId}",
      ),
    ).toMatchObject({ receipts: [{ lines: [{ quantity: 4 }] }] });

    const notCancelled = await sendWithToken(
      "POST",
      `/api/v1/purchase-orders/${draft.id}/cancel`,
      buyer,
      { reason: "Too late" },
    );
    expect(notCancelled.status).toBe(409);
    await expectConforming(
      notCancelled,
      "POST",
      "/api/v1/purchase-orders/{orderId}/cancel",
    );

    const closed = await sendWithToken(
      "POST",
      `/api/v1/purchase-orders/${draft.id}/close`,
      buyer,
      { reason: "The rest is discontinued." },
    );
    expect(closed.status, await closed.clone().text()).toBe(200);
    expect(
      await expectConforming(
        closed,
        "POST",
        "/api/v1/purchase-orders/{orderId}/close",
      ),
    ).toMatchObject({
      status: "closed_short",
      endReason: "The rest is discontinued.",
    });

    const other = await newDraft();
    const cancelled = await sendWithToken(
      "POST",
      `/api/v1/purchase-orders/${other.id}/cancel`,
      buyer,
    );
    expect(cancelled.status).toBe(200);
    expect(
      await expectConforming(
        cancelled,
        "POST",
        "/api/v1/purchase-orders/{orderId}/cancel",
      ),
    ).toMatchObject({ status: "cancelled" });
  });

  it("refuses as documented: bad bodies and queries, roles, no such order, wrong states", async () => {
    const badBody = await sendWithToken(
      "POST",
      "/api/v1/purchase-orders",
      buyer,
      {
        supplierId,
        lines: [{ sku, quantity: -1 }],
      },
    );
    expect(badBody.status).toBe(400);
    await expectConforming(badBody, "POST", "/api/v1/purchase-orders");

    const noSupplier = await sendWithToken(
      "POST",
      "/api/v1/purchase-orders",
      buyer,
      {
        supplierId: 2_147_483_000,
        lines: [],
      },
    );
    expect(noSupplier.status).toBe(422);
    await expectConforming(noSupplier, "POST", "/api/v1/purchase-orders");

    const role = await sendWithToken(
      "POST",
      "/api/v1/purchase-orders",
      storekeeper,
      {
        supplierId,
        lines: [],
      },
    );
    expect(role.status).toBe(403);
    await expectConforming(role, "POST", "/api/v1/purchase-orders");

    const badQuery = await sendWithToken(
      "GET",
      "/api/v1/purchase-orders?status=lost",
      buyer,
    );
    expect(badQuery.status).toBe(400);
    await expectConforming(badQuery, "GET", "/api/v1/purchase-orders");

    const anonymous = await fetch(`${baseUrl()}/api/v1/purchase-orders`);
    expect(anonymous.status).toBe(401);
    await expectConforming(anonymous, "GET", "/api/v1/purchase-orders");

    for (const missingId of ["2147483000", "PO-x"]) {
      const missing = await sendWithToken(
        "GET",
        `/api/v1/purchase-orders/${missingId}`,
        buyer,
      );
      expect(missing.status).toBe(404);
      await expectConforming(
        missing,
        "GET",
        "/api/v1/purchase-orders/{orderId}",
      );
    }
    const patchMissing = await sendWithToken(
      "PATCH",
      "/api/v1/purchase-orders/2147483000",
      buyer,
      {
        notes: "x",
      },
    );
    expect(patchMissing.status).toBe(404);
    await expectConforming(
      patchMissing,
      "PATCH",
      "/api/v1/purchase-orders/{orderId}",
    );
    for (const step of ["send", "cancel", "close"]) {
      const missingStep = await sendWithToken(
        "POST",
        `/api/v1/purchase-orders/2147483000/${step}`,
        buyer,
      );
      expect(missingStep.status).toBe(404);
      await expectConforming(
        missingStep,
        "POST",
        `/api/v1/purchase-orders/{orderId}/${step}`,
      );
      const stepRole = await sendWithToken(
        "POST",
        `/api/v1/purchase-orders/2147483000/${step}`,
        storekeeper,
      );
      expect(stepRole.status).toBe(403);
      await expectConforming(
        stepRole,
        "POST",
        `/api/v1/purchase-orders/{orderId}/${step}`,
      );
    }

    // A draft to a supplier without any e-mail address cannot be sent.
    const bare = await createOrderSupplier("EUR");
    const unsendable = await newDraft(bare);
    const noAddress = await sendWithToken(
      "POST",
      `/api/v1/purchase-orders/${unsendable.id}/send`,
      buyer,
    );
    expect(noAddress.status).toBe(422);
    await expectConforming(
      noAddress,
      "POST",
      "/api/v1/purchase-orders/{orderId}/send",
    );

    const badReason = await sendWithToken(
      "POST",
      `/api/v1/purchase-orders/${unsendable.id}/cancel`,
      buyer,
      { reason: 5 },
    );
    expect(badReason.status).toBe(400);
    await expectConforming(
      badReason,
      "POST",
      "/api/v1/purchase-orders/{orderId}/cancel",
    );

    const notSent = await sendWithToken(
      "POST",
      `/api/v1/purchase-orders/${unsendable.id}/close`,
      buyer,
    );
    expect(notSent.status).toBe(409);
    await expectConforming(
      notSent,
      "POST",
      "/api/v1/purchase-orders/{orderId}/close",
    );

    const noLine = await sendWithToken(
      "PATCH",
      `/api/v1/purchase-orders/${unsendable.id}`,
      buyer,
      {
        lines: [{ id: 2_147_483_000, quantity: 1 }],
      },
    );
    expect(noLine.status).toBe(422);
    await expectConforming(
      noLine,
      "PATCH",
      "/api/v1/purchase-orders/{orderId}",
    );

    const draftReceipt = await sendWithToken(
      "POST",
      `/api/v1/purchase-orders/${unsendable.id}/receipts`,
      storekeeper,
      {
        lines: [
          { lineId: unsendable.lines[0]!.id, location: rack, quantity: 1 },
        ],
      },
    );
    expect(draftReceipt.status).toBe(422);
    await expectConforming(
      draftReceipt,
      "POST",
      "/api/v1/purchase-orders/{orderId}/receipts",
    );

    // A sent order (written as sending leaves it): past its tolerance, a bad body, a role.
    const sent = await createOrder({
      supplierId: bare,
      userId: (await newPerson("buyer")).id,
      lines: [{ itemId: await itemIdOf(sku), quantity: "5.000" }],
    });
    const receipts = `/api/v1/purchase-orders/${sent.id}/receipts`;
    const tooMuch = await sendWithToken("POST", receipts, storekeeper, {
      lines: [{ lineId: sent.lineIds[0], location: rack, quantity: 6 }],
    });
    expect(tooMuch.status, await tooMuch.clone().text()).toBe(409);
    await expectConforming(
      tooMuch,
      "POST",
      "/api/v1/purchase-orders/{orderId}/receipts",
    );

    const editSent = await sendWithToken(
      "PATCH",
      `/api/v1/purchase-orders/${sent.id}`,
      buyer,
      {
        notes: "Too late",
      },
    );
    expect(editSent.status).toBe(409);
    await expectConforming(
      editSent,
      "PATCH",
      "/api/v1/purchase-orders/{orderId}",
    );

    const resend = await sendWithToken(
      "POST",
      `/api/v1/purchase-orders/${sent.id}/send`,
      buyer,
    );
    expect(resend.status).toBe(409);
    await expectConforming(
      resend,
      "POST",
      "/api/v1/purchase-orders/{orderId}/send",
    );

    const badReceipt = await sendWithToken("POST", receipts, storekeeper, {
      lines: [],
    });
    expect(badReceipt.status).toBe(400);
    await expectConforming(
      badReceipt,
      "POST",
      "/api/v1/purchase-orders/{orderId}/receipts",
    );

    const receiptRole = await sendWithToken("POST", receipts, buyer, {
      lines: [{ lineId: sent.lineIds[0], location: rack, quantity: 1 }],
    });
    expect(receiptRole.status).toBe(403);
    await expectConforming(
      receiptRole,
      "POST",
      "/api/v1/purchase-orders/{orderId}/receipts",
    );

    for (const missingOrder of ["PO-2147483000", "nothing"]) {
      const missing = await sendWithToken(
        "POST",
        `/api/v1/purchase-orders/${missingOrder}/receipts`,
        storekeeper,
        { lines: [{ lineId: 1, location: rack, quantity: 1 }] },
      );
      expect(missing.status).toBe(404);
      await expectConforming(
        missing,
        "POST",
        "/api/v1/purchase-orders/{orderId}/receipts",
      );
    }
  });
});
