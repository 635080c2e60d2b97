/**
 * The designs operations answer as the contract says (docs/decisions/046): designs and
 * revisions, costing, substitutes from stock and the insight, each status one the
 * operation documents and each body matching its documented schema.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  baseUrl,
  bearerTokenAs,
  sendWithToken,
  signInAs,
} from "../support/app-client";
import { expectConforming } from "../support/api-contract";
import {
  createMagnetItem,
  createPartItem,
  createWireItem,
} from "../support/build-order-fixtures";
import { createPricedReleasedDesign } from "../support/insight-fixtures";
import { quoteDesignItems } from "../support/price-list-fixtures";
import { createSubstituteScene } from "../support/substitute-fixtures";
import { closeTestDatabase, uniqueCode } from "../support/test-database";

let buyer = "";
let builder = "";
let storekeeper = "";
let manager = "";
let wireSku = "";
let magnetSku = "";
let partSku = "";

/** Prices dated in 2032, so no other test's prices or metal base meet them. */
const costingDay = "2032-03-01";

beforeAll(async () => {
  buyer = await bearerTokenAs("buyer");
  builder = await bearerTokenAs("builder");
  storekeeper = await bearerTokenAs("storekeeper");
  manager = await bearerTokenAs("manager");
  const buyerCookie = await signInAs("buyer");
  wireSku = (await createWireItem(buyerCookie)).sku;
  magnetSku = (await createMagnetItem(buyerCookie)).sku;
  partSku = (await createPartItem(buyerCookie)).sku;
  await quoteDesignItems(buyerCookie, {
    supplier: `Contract design supplier ${uniqueCode("S")}`,
    fileName: "contract-design-prices.csv",
    validFrom: "2032-01-01",
    wireSku,
    magnetSku,
    partSku,
  });
  const base = await sendWithToken("PUT", "/api/v1/metal-base", buyer, {
    conductor: "copper",
    currency: "EUR",
    pricePerKg: 9,
    validFrom: "2032-01-01",
  });
  expect(base.status, await base.clone().text()).toBeLessThan(300);
});
afterAll(closeTestDatabase);

const fields = {
  poles: 14,
  slots: 12,
  ratedCurrentA: 6,
  ratedTorqueNm: 1.25,
  torqueBasis: "measured",
  insulationClassC: 155,
  slotAreaMm2: 60,
  ratedSpeedRpm: 1500,
  airGapRadiusMm: 30.4,
  airGapFluxDensityT: 0.82,
  poleCoverage: 0.83,
};

const lines = () => [
  {
    kind: "coil",
    sku: wireSku,
    turns: 18,
    strandsInHand: 2,
    activeLengthMm: 31,
    endTurnLengthMm: 11,
    leadLengthMm: 80,
    coilsPerMotor: 12,
    scrapPercent: 3,
    operatingTemperatureC: 120,
  },
  {
    kind: "magnet",
    sku: magnetSku,
    piecesPerMotor: 14,
    operatingTemperatureC: 100,
  },
  { kind: "part", sku: partSku, quantityPerMotor: 2 },
];

const designs = "/api/v1/designs";
const oneDesign = "/api/v1/designs/{designId}";
const revisions = "/api/v1/designs/{designId}/revisions";
const oneRevision = "/api/v1/designs/{designId}/revisions/{revision}";
const release = "/api/v1/designs/{designId}/revisions/{revision}/release";
const costing = "/api/v1/designs/{designId}/revisions/{revision}/costing";
const substitutes =
  "/api/v1/designs/{designId}/revisions/{revision}/lines/{line}/substitutes";

describe("the designs operations against the contract", () => {
  it("adds, lists, reads, changes, costs, releases and revises a design as documented", async () => {
    const name = uniqueCode("Contract outrunner");
    const created = await sendWithToken("POST", designs, builder, {
      name,
      motorType: "Outrunner, 12 slots / 14 poles",
      ...fields,
    });
    expect(created.status, await created.clone().text()).toBe(201);
    const { id } = (await expectConforming(created, "POST", designs)) as {
      id: number;
    };

    const page = await sendWithToken("GET", `${designs}?perPage=200`, manager);
    expect(page.status).toBe(200);
    expect(Number(page.headers.get("X-Total-Count"))).toBeGreaterThan(0);
    await expectConforming(page, "GET", designs);

    const changed = await sendWithToken(
      "PUT",
      `${designs}/${id}/revisions/1`,
      builder,
      { notes: "Contract test", lines: lines() },
    );
    expect(changed.status, await changed.clone().text()).toBe(200);
    expect(await expectConforming(changed, "PUT", oneRevision)).toMatchObject({
      notes: "Contract test",
      status: "draft",
    });

    const read = await sendWithToken(
      "GET",
      `${designs}/${id}/revisions/1`,
      storekeeper,
    );
    expect(read.status).toBe(200);
    const revision = (await expectConforming(read, "GET", oneRevision)) as {
      lines: { kind: string }[];
    };
    expect(revision.lines.map((line) => line.kind)).toEqual([
      "coil",
      "magnet",
      "part",
    ]);

    for (const basis of ["best-price", "stock-average"]) {
      const costed = await sendWithToken(
        "GET",
        `${designs}/${id}/revisions/1/costing?quantity=50&basis=${basis}&date=${costingDay}`,
        manager,
      );
      expect(costed.status, await costed.clone().text()).toBe(200);
      expect(await expectConforming(costed, "GET", costing)).toMatchObject({
        basis,
        quantity: 50,
      });
    }
    // Without the air-gap figures the estimate and Kt say what is missing instead.
    const bare = await sendWithToken(
      "PUT",
      `${designs}/${id}/revisions/1`,
      builder,
      { airGapRadiusMm: null, ratedSpeedRpm: null },
    );
    expect(bare.status, await bare.clone().text()).toBe(200);
    const missing = await sendWithToken(
      "GET",
      `${designs}/${id}/revisions/1/costing?date=${costingDay}`,
      manager,
    );
    expect(await expectConforming(missing, "GET", costing)).toMatchObject({
      torqueEstimate: { missing: expect.any(String) },
    });

    const released = await sendWithToken(
      "POST",
      `${designs}/${id}/revisions/1/release`,
      builder,
    );
    expect(released.status, await released.clone().text()).toBe(200);
    await expectConforming(released, "POST", release);

    const next = await sendWithToken(
      "POST",
      `${designs}/${id}/revisions`,
      builder,
    );
    expect(next.status, await next.clone().text()).toBe(201);
    expect(await expectConforming(next, "POST", revisions)).toEqual({
      revision: 2,
    });

    const design = await sendWithToken("GET", `${designs}/${id}`, buyer);
    expect(design.status).toBe(200);
    expect(await expectConforming(design, "GET", oneDesign)).toMatchObject({
      id,
      name,
      revisions: [
        { revision: 2, status: "draft", releasedAt: null },
        { revision: 1, status: "released" },
      ],
    });
  });

  it("refuses designs and revisions as documented", async () => {
    const name = uniqueCode("Contract refusals");
    const first = await sendWithToken("POST", designs, builder, {
      name,
      ...fields,
    });
    expect(first.status).toBe(201);
    const { id } = (await first.json()) as { id: number };

    const duplicate = await sendWithToken("POST", designs, builder, {
      name,
      ...fields,
    });
    expect(duplicate.status).toBe(409);
    await expectConforming(duplicate, "POST", designs);

    const badBody = await sendWithToken("POST", designs, builder, {
      name: "",
      poles: 13,
    });
    expect(badBody.status).toBe(400);
    await expectConforming(badBody, "POST", designs);

    const notBuilder = await sendWithToken("POST", designs, buyer, {
      name: uniqueCode("No"),
      ...fields,
    });
    expect(notBuilder.status).toBe(403);
    await expectConforming(notBuilder, "POST", designs);

    const badPage = await sendWithToken("GET", `${designs}?page=0`, builder);
    expect(badPage.status).toBe(400);
    await expectConforming(badPage, "GET", designs);

    const anonymous = await fetch(`${baseUrl()}${designs}`);
    expect(anonymous.status).toBe(401);
    await expectConforming(anonymous, "GET", designs);

    const noDesign = await sendWithToken("GET", `${designs}/999999999`, buyer);
    expect(noDesign.status).toBe(404);
    await expectConforming(noDesign, "GET", oneDesign);

    const noRevision = await sendWithToken(
      "GET",
      `${designs}/${id}/revisions/99`,
      buyer,
    );
    expect(noRevision.status).toBe(404);
    await expectConforming(noRevision, "GET", oneRevision);

    const badLines = await sendWithToken(
      "PUT",
      `${designs}/${id}/revisions/1`,
      builder,
      { lines: [{ kind: "coil", sku: partSku }] },
    );
    expect(badLines.status).toBe(400);
    await expectConforming(badLines, "PUT", oneRevision);

    const wrongItem = await sendWithToken(
      "PUT",
      `${designs}/${id}/revisions/1`,
      builder,
      { lines: [{ ...lines()[0], sku: partSku }] },
    );
    expect(wrongItem.status).toBe(400);
    await expectConforming(wrongItem, "PUT", oneRevision);

    const changeAsBuyer = await sendWithToken(
      "PUT",
      `${designs}/${id}/revisions/1`,
      buyer,
      { notes: "No" },
    );
    expect(changeAsBuyer.status).toBe(403);
    await expectConforming(changeAsBuyer, "PUT", oneRevision);

    const changeMissing = await sendWithToken(
      "PUT",
      `${designs}/${id}/revisions/99`,
      builder,
      { notes: "No" },
    );
    expect(changeMissing.status).toBe(404);
    await expectConforming(changeMissing, "PUT", oneRevision);

    const empty = await sendWithToken(
      "POST",
      `${designs}/${id}/revisions/1/release`,
      builder,
    );
    expect(empty.status).toBe(409);
    await expectConforming(empty, "POST", release);

    const releaseAsManager = await sendWithToken(
      "POST",
      `${designs}/${id}/revisions/1/release`,
      manager,
    );
    expect(releaseAsManager.status).toBe(403);
    await expectConforming(releaseAsManager, "POST", release);

    const releaseMissing = await sendWithToken(
      "POST",
      `${designs}/${id}/revisions/99/release`,
      builder,
    );
    expect(releaseMissing.status).toBe(404);
    await expectConforming(releaseMissing, "POST", release);

    const whileDraft = await sendWithToken(
      "POST",
      `${designs}/${id}/revisions`,
      builder,
    );
    expect(whileDraft.status).toBe(409);
    await expectConforming(whileDraft, "POST", revisions);

    const reviseMissing = await sendWithToken(
      "POST",
      `${designs}/999999999/revisions`,
      builder,
    );
    expect(reviseMissing.status).toBe(404);
    await expectConforming(reviseMissing, "POST", revisions);

    const reviseAsStorekeeper = await sendWithToken(
      "POST",
      `${designs}/${id}/revisions`,
      storekeeper,
    );
    expect(reviseAsStorekeeper.status).toBe(403);
    await expectConforming(reviseAsStorekeeper, "POST", revisions);

    // Once released, a revision is read-only.
    const filled = await sendWithToken(
      "PUT",
      `${designs}/${id}/revisions/1`,
      builder,
      { lines: lines() },
    );
    expect(filled.status).toBe(200);
    const released = await sendWithToken(
      "POST",
      `${designs}/${id}/revisions/1/release`,
      builder,
    );
    expect(released.status).toBe(200);
    const lockedChange = await sendWithToken(
      "PUT",
      `${designs}/${id}/revisions/1`,
      builder,
      { notes: "Too late" },
    );
    expect(lockedChange.status).toBe(409);
    await expectConforming(lockedChange, "PUT", oneRevision);
    const releasedAgain = await sendWithToken(
      "POST",
      `${designs}/${id}/revisions/1/release`,
      builder,
    );
    expect(releasedAgain.status).toBe(409);
    await expectConforming(releasedAgain, "POST", release);

    const badQuantity = await sendWithToken(
      "GET",
      `${designs}/${id}/revisions/1/costing?quantity=0`,
      buyer,
    );
    expect(badQuantity.status).toBe(400);
    await expectConforming(badQuantity, "GET", costing);

    const noCosting = await sendWithToken(
      "GET",
      `${designs}/${id}/revisions/99/costing`,
      buyer,
    );
    expect(noCosting.status).toBe(404);
    await expectConforming(noCosting, "GET", costing);
  });

  it("lists and applies substitutes from stock as documented", async () => {
    const scene = await createSubstituteScene();
    const { designId } = scene.design;
    const path = (revision: number, line: number) =>
      `${designs}/${designId}/revisions/${revision}/lines/${line}/substitutes`;

    const listed = await sendWithToken("GET", path(1, 1), storekeeper);
    expect(listed.status, await listed.clone().text()).toBe(200);
    const list = (await expectConforming(listed, "GET", substitutes)) as {
      substitutes: { sku: string; strands: number }[];
    };
    const choice = list.substitutes.find(
      (entry) => entry.sku === scene.twoOf071.sku,
    );
    expect(choice).toBeDefined();

    const notCoil = await sendWithToken("GET", path(1, 2), storekeeper);
    expect(notCoil.status).toBe(409);
    await expectConforming(notCoil, "GET", substitutes);

    const noLine = await sendWithToken("GET", path(1, 9), storekeeper);
    expect(noLine.status).toBe(404);
    await expectConforming(noLine, "GET", substitutes);

    const badTolerance = await sendWithToken(
      "GET",
      `${path(1, 1)}?tolerance=99`,
      storekeeper,
    );
    expect(badTolerance.status).toBe(400);
    await expectConforming(badTolerance, "GET", substitutes);

    const asBuyer = await sendWithToken("POST", path(1, 1), buyer, {
      sku: choice!.sku,
      strands: choice!.strands,
    });
    expect(asBuyer.status).toBe(403);
    await expectConforming(asBuyer, "POST", substitutes);

    const badChoice = await sendWithToken("POST", path(1, 1), builder, {
      sku: "",
      strands: 0,
    });
    expect(badChoice.status).toBe(400);
    await expectConforming(badChoice, "POST", substitutes);

    // On the released revision: a new draft revision with the line changed.
    const applied = await sendWithToken("POST", path(1, 1), builder, {
      sku: choice!.sku,
      strands: choice!.strands,
    });
    expect(applied.status, await applied.clone().text()).toBe(201);
    expect(await expectConforming(applied, "POST", substitutes)).toMatchObject({
      revision: 2,
      status: "draft",
    });

    // The design has a draft now: the released revision takes no second one.
    const draftExists = await sendWithToken("POST", path(1, 1), builder, {
      sku: choice!.sku,
      strands: choice!.strands,
    });
    expect(draftExists.status).toBe(409);
    await expectConforming(draftExists, "POST", substitutes);

    // On the draft the line changes in place: back to the original wire.
    const back = (
      (await (await sendWithToken("GET", path(2, 1), builder)).json()) as {
        substitutes: { sku: string; strands: number }[];
      }
    ).substitutes.find((entry) => entry.sku === scene.original.sku);
    expect(back).toBeDefined();
    const inPlace = await sendWithToken("POST", path(2, 1), builder, {
      sku: back!.sku,
      strands: back!.strands,
    });
    expect(inPlace.status, await inPlace.clone().text()).toBe(200);
    await expectConforming(inPlace, "POST", substitutes);

    const noDesign = await sendWithToken(
      "POST",
      `${designs}/999999999/revisions/1/lines/1/substitutes`,
      builder,
      { sku: choice!.sku, strands: choice!.strands },
    );
    expect(noDesign.status).toBe(404);
    await expectConforming(noDesign, "POST", substitutes);
  });

  it("answers the design and stock-value insight as documented", async () => {
    const { designId } = await createPricedReleasedDesign();
    const insight = "/api/v1/insight/designs";
    const plain = await sendWithToken(
      "GET",
      `${insight}?perPage=5`,
      storekeeper,
    );
    expect(plain.status, await plain.clone().text()).toBe(200);
    expect(Number(plain.headers.get("X-Total-Count"))).toBeGreaterThan(0);
    await expectConforming(plain, "GET", insight);

    const whatIf = await sendWithToken(
      "GET",
      `${insight}?perPage=5&history=1&basis=stock-average&copperBase=9.5&endTurn.${designId}=1.2`,
      manager,
    );
    expect(whatIf.status, await whatIf.clone().text()).toBe(200);
    const figures = (await expectConforming(whatIf, "GET", insight)) as {
      designId: number;
      asStored: unknown;
      costHistory?: unknown[];
    }[];
    const ours = figures.find((entry) => entry.designId === designId);
    expect(ours?.asStored).not.toBeNull();
    expect(ours?.costHistory).toHaveLength(12);

    const badQuery = await sendWithToken(
      "GET",
      `${insight}?perPage=51`,
      manager,
    );
    expect(badQuery.status).toBe(400);
    await expectConforming(badQuery, "GET", insight);

    const stockValue = "/api/v1/insight/stock-value";
    const value = await sendWithToken("GET", stockValue, buyer);
    expect(value.status).toBe(200);
    expect(await expectConforming(value, "GET", stockValue)).toMatchObject({
      trend: expect.any(Array),
    });

    const anonymous = await fetch(`${baseUrl()}${stockValue}`);
    expect(anonymous.status).toBe(401);
    await expectConforming(anonymous, "GET", stockValue);
  });
});
