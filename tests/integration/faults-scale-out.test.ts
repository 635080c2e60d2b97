/**
 * Two app processes on different ports against one database, as behind a load
 * balancer: a session started on one is valid (and ended) on the other, the
 * sign-in throttle counts failures made on both, and reservations sent to both
 * at once never hold more than there is. Everything each process knows lives
 * in MariaDB, so none of this depends on which process answers.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import {
  startAppServer,
  type AppServer,
} from "../../scripts/lib/test-environment";
import type { Role } from "~/lib/roles";
import { newPerson, uniqueEmail } from "../support/app-client";
import {
  createPartItem,
  receive,
  reservationBooks,
} from "../support/build-order-fixtures";
import { createDesign } from "../support/design-fixtures";
import { AppClient, cleanUp, faultPorts } from "../support/fault-environment";
import {
  closeTestDatabase,
  createLocation,
  createPerson,
  uniqueCode,
} from "../support/test-database";

let first: AppServer;
let second: AppServer;
let one: AppClient;
let two: AppClient;

beforeAll(async () => {
  const options = {
    databaseUrl: inject("databaseUrl"),
    smtpUrl: inject("smtpUrl"),
  };
  [first, second] = await Promise.all([
    startAppServer({ port: faultPorts.apps[2], ...options }),
    startAppServer({ port: faultPorts.apps[3], ...options }),
  ]);
  one = new AppClient(first.baseUrl);
  two = new AppClient(second.baseUrl);
});

afterAll(() =>
  cleanUp(
    () => first?.stop(),
    () => second?.stop(),
    () => closeTestDatabase(),
  ),
);

const password = "correct horse battery staple";

describe("two app processes on one database", () => {
  it("are two processes on two ports", () => {
    expect(first.pid).not.toBe(second.pid);
    expect(first.baseUrl).not.toBe(second.baseUrl);
    expect(first.running() && second.running()).toBe(true);
  });

  it("a session started on one is valid on the other, and signing out on the other ends it on both", async () => {
    const email = uniqueEmail("two-servers");
    await createPerson({ email, password, roles: ["storekeeper"] });
    const cookie = await one.signIn(email, password);

    const me = await two.get("/api/v1/me", cookie);
    expect(me.status).toBe(200);
    expect(await me.json()).toMatchObject({ user: { email } });
    const page = await two.get("/stock", cookie);
    expect(page.status).toBe(200);

    const signOut = await two.send(
      "DELETE",
      "/api/v1/sessions",
      undefined,
      cookie,
    );
    expect(signOut.status).toBe(204);
    expect((await one.get("/api/v1/me", cookie)).status).toBe(401);
    expect((await two.get("/api/v1/me", cookie)).status).toBe(401);
  });

  it("the sign-in throttle counts failed attempts made on both: the 6th is refused with 429 on either", async () => {
    const email = uniqueEmail("throttle-two");
    await createPerson({ email, password, roles: ["buyer"] });
    for (const [attempt, server] of [one, two, one, two, one].entries()) {
      const response = await server.send("POST", "/api/v1/sessions", {
        email,
        password: `wrong-${attempt}`,
      });
      expect(response.status, `attempt ${attempt + 1}`).toBe(401);
    }
    for (const server of [two, one]) {
      const sixth = await server.send("POST", "/api/v1/sessions", {
        email,
        password,
      });
      expect(sixth.status).toBe(429);
      expect(Number(sixth.headers.get("Retry-After"))).toBeGreaterThan(0);
    }
  });

  it("reservations sent to both at once never hold more than is on hand; each order holds all its lines or nothing", async () => {
    const signInAs = async (role: Role) => {
      const person = await newPerson(role);
      return one.signIn(person.email, person.password);
    };
    const buyer = await signInAs("buyer");
    const storekeeper = await signInAs("storekeeper");
    const builder = await signInAs("builder");

    // 100 shafts and 60 bearings; a motor takes 7 shafts and 5 bearings: bearings
    // run out after 12 motors, while shafts alone would last 14.
    const rack = await createLocation(uniqueCode("SO"));
    const shaft = await createPartItem(buyer);
    const bearing = await createPartItem(buyer);
    await receive(storekeeper, {
      sku: shaft.sku,
      location: rack,
      quantity: 100,
      unitCost: 3,
    });
    await receive(storekeeper, {
      sku: bearing.sku,
      location: rack,
      quantity: 60,
      unitCost: 1.5,
    });
    const design = await createDesign([
      { kind: "part", itemId: shaft.id, quantityPerMotor: "7" },
      { kind: "part", itemId: bearing.id, quantityPerMotor: "5" },
    ]);
    const orders: number[] = [];
    for (let index = 0; index < 30; index += 1) {
      const created = await (index % 2 ? two : one).send(
        "POST",
        "/api/v1/build-orders",
        { designId: design.designId, revision: design.revision, quantity: 1 },
        builder,
      );
      expect(created.status, await created.clone().text()).toBe(201);
      orders.push(((await created.json()) as { id: number }).id);
    }

    // 30 reservations at once, alternating between the two processes.
    const answers = await Promise.all(
      orders.map((id, index) =>
        (index % 2 ? two : one).send(
          "POST",
          `/api/v1/build-orders/${id}/reserve`,
          {},
          builder,
        ),
      ),
    );
    const statuses = answers.map((answer) => answer.status);
    for (const status of statuses) expect([200, 409]).toContain(status);
    const granted = orders.filter((_, index) => statuses[index] === 200);
    // The bearings cover exactly 12 motors, whichever process took them.
    expect(granted.length).toBe(12);

    for (const id of orders) {
      const read = await two.get(`/api/v1/build-orders/${id}`, builder);
      expect(read.status).toBe(200);
      const order = (await read.json()) as {
        status: string;
        lines: { required: number; reserved: number }[];
      };
      if (granted.includes(id)) {
        expect(order.status).toBe("reserved");
        for (const line of order.lines)
          expect(line.reserved).toBe(line.required);
      } else {
        expect(order.status).toBe("draft");
        for (const line of order.lines) expect(line.reserved).toBe(0);
      }
    }
    for (const [item, perMotor, onHand] of [
      [shaft, 7, 100],
      [bearing, 5, 60],
    ] as const) {
      const books = await reservationBooks(item.id);
      expect(books.onHand).toBe(onHand);
      expect(books.reserved).toBe(granted.length * perMotor);
      expect(books.reserved).toBeLessThanOrEqual(books.onHand);
      expect(books.heldTotal).toBe(books.grams(books.reserved));
      expect(books.linesReserved).toBe(books.heldTotal);
      for (const balance of books.balances)
        expect(balance.reserved).toBeLessThanOrEqual(balance.onHand);
    }
  });
});
