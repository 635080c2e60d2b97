/**
 * The price operations (metal base, currency rates, an item's prices) and the buying plan
 * answer as the contract says (docs/decisions/046): each status one the operation
 * documents, each body matching its documented schema.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  baseUrl,
  bearerTokenAs,
  sendWithToken,
  signInAs,
} from "../support/app-client";
import { expectConforming } from "../support/api-contract";
import { expectAnswersConforming } from "../support/api-contract-answers";
import {
  createBuyingPlanFixture,
  type BuyingPlanFixture,
} from "../support/buying-plan-fixtures";
import { closeTestDatabase } from "../support/test-database";

const metalBase = "/api/v1/metal-base";
const rates = "/api/v1/currency-rates";
const prices = "/api/v1/items/{sku}/prices";
const plan = "/api/v1/buying-plan";

let buyer = "";
let builder = "";
let fixture: BuyingPlanFixture;

beforeAll(async () => {
  buyer = await bearerTokenAs("buyer");
  builder = await bearerTokenAs("builder");
  fixture = await createBuyingPlanFixture({
    buyer: await signInAs("buyer"),
    builder: await signInAs("builder"),
    storekeeper: await signInAs("storekeeper"),
  });
});
afterAll(closeTestDatabase);

/** A day long before the demo's prices and rates, so setting one changes no price a test reads. */
const longAgo = "2001-03-05";

describe("the price operations against the contract", () => {
  it("reads and sets the metal base as documented", async () => {
    const read = await sendWithToken("GET", metalBase, builder);
    expect(read.status).toBe(200);
    const bases = (await expectConforming(read, "GET", metalBase)) as unknown[];
    // The demo keeps copper and aluminium bases in EUR.
    expect(bases).toEqual(
      expect.arrayContaining([
        expect.objectContaining({ conductor: "copper", currency: "EUR" }),
        expect.objectContaining({ conductor: "aluminium", currency: "EUR" }),
      ]),
    );

    const set = await sendWithToken("PUT", metalBase, buyer, {
      conductor: "aluminium",
      currency: "CHF",
      pricePerKg: 2.5,
      validFrom: longAgo,
    });
    expect(set.status, await set.clone().text()).toBe(200);
    await expectConforming(set, "PUT", metalBase);
  });

  it("reads and sets currency rates as documented", async () => {
    const read = await sendWithToken("GET", rates, builder);
    expect(read.status).toBe(200);
    expect(await expectConforming(read, "GET", rates)).toMatchObject({
      companyCurrency: fixture.currency,
    });

    const set = await sendWithToken("PUT", rates, buyer, {
      currency: "CHF",
      rate: 1.0625,
      validFrom: longAgo,
    });
    expect(set.status, await set.clone().text()).toBe(200);
    const body = (await expectConforming(set, "PUT", rates)) as {
      rates: { currency: string; rate: number; validFrom: string }[];
    };
    expect(body.rates).toContainEqual({
      currency: "CHF",
      rate: 1.0625,
      validFrom: longAgo,
    });
  });

  it("prices an item from every supplier, with its history, as documented", async () => {
    // The fixture's resin: three fixed-price lines from two suppliers.
    const resin = await sendWithToken(
      "GET",
      `/api/v1/items/${fixture.resin}/prices?quantity=30&history=1`,
      builder,
    );
    expect(resin.status).toBe(200);
    const body = (await expectConforming(resin, "GET", prices)) as {
      prices: { unitPrice: number }[];
      history: { series: unknown[] };
    };
    expect(body.prices.map((price) => price.unitPrice)).toEqual([16, 21]);
    expect(body.history.series).toHaveLength(2);

    // The demo's copper wire: priced as an adder on the copper base.
    const wire = await sendWithToken(
      "GET",
      "/api/v1/items/CU-IEC-0500/prices?quantity=10",
      builder,
    );
    expect(wire.status).toBe(200);
    const wirePrices = (await expectConforming(wire, "GET", prices)) as {
      prices: { adderPerKg: number | null }[];
      history?: unknown;
    };
    expect(wirePrices.history).toBeUndefined();
    expect(wirePrices.prices.some((price) => price.adderPerKg !== null)).toBe(
      true,
    );
  });

  it("prices an item quoted in another currency with its rate, as documented", async () => {
    // Marrowfield quotes the demo's arc magnets in USD.
    const response = await sendWithToken(
      "GET",
      "/api/v1/items/MG-N38UH-A28/prices?quantity=100",
      builder,
    );
    expect(response.status).toBe(200);
    const body = (await expectConforming(response, "GET", prices)) as {
      prices: { currency: string; rate: number | null }[];
    };
    expect(body.prices).toContainEqual(
      expect.objectContaining({ currency: "USD", rate: expect.any(Number) }),
    );
  });

  it("gives the buying plan as documented", async () => {
    const response = await sendWithToken("GET", `${plan}?weeks=6`, builder);
    expect(response.status).toBe(200);
    const body = (await expectConforming(response, "GET", plan)) as {
      weeks: string[];
      suggestions: { sku: string; draftOrders: { id: number }[] }[];
    };
    expect(body.weeks).toHaveLength(6);
    const resin = body.suggestions.find(
      (suggestion) => suggestion.sku === fixture.resin,
    );
    expect(resin?.draftOrders).toContainEqual(
      expect.objectContaining({ id: fixture.fixtureDraft }),
    );
  });

  it("refuses as documented: bad bodies and queries, roles, the company currency, a missing item, no sign-in", async () => {
    await expectAnswersConforming([
      [
        await sendWithToken("PUT", metalBase, buyer, {
          conductor: "silver",
          currency: "EUR",
          pricePerKg: 1,
          validFrom: longAgo,
        }),
        "PUT",
        metalBase,
        400,
      ],
      [
        await sendWithToken("PUT", metalBase, builder, {
          conductor: "copper",
          currency: "EUR",
          pricePerKg: 9,
          validFrom: longAgo,
        }),
        "PUT",
        metalBase,
        403,
      ],
      [await fetch(`${baseUrl()}${metalBase}`), "GET", metalBase, 401],
      [
        await sendWithToken("PUT", rates, buyer, {
          currency: fixture.currency,
          rate: 1,
          validFrom: longAgo,
        }),
        "PUT",
        rates,
        400,
      ],
      [
        await sendWithToken("PUT", rates, buyer, { currency: "CHF" }),
        "PUT",
        rates,
        400,
      ],
      [
        await sendWithToken("PUT", rates, builder, {
          currency: "CHF",
          rate: 1.1,
          validFrom: longAgo,
        }),
        "PUT",
        rates,
        403,
      ],
      [await fetch(`${baseUrl()}${rates}`), "GET", rates, 401],
      [
        await sendWithToken(
          "GET",
          `/api/v1/items/${fixture.resin}/prices?quantity=-1`,
          builder,
        ),
        "GET",
        prices,
        400,
      ],
      [
        await sendWithToken(
          "GET",
          "/api/v1/items/NO-SUCH-SKU-0/prices",
          builder,
        ),
        "GET",
        prices,
        404,
      ],
      [
        await sendWithToken("GET", `${plan}?weeks=27`, builder),
        "GET",
        plan,
        400,
      ],
      [await fetch(`${baseUrl()}${plan}`), "GET", plan, 401],
    ]);
  });
});
