import type { ServerBuild } from "react-router";
import { describe, expect, it } from "vitest";
import { sizeJsonAnswers } from "./sized-json-answers";

type Handler = (args: { request: Request }) => Promise<unknown>;

/** A build of one route with the given module. */
function buildOf(module: Record<string, unknown>): ServerBuild {
  return {
    routes: { route: { id: "route", path: "x", module } },
  } as unknown as ServerBuild;
}

function loaderOf(build: ServerBuild): Handler {
  return build.routes.route!.module.loader as unknown as Handler;
}

const args = { request: new Request("http://localhost/api/v1/x") };

describe("sizeJsonAnswers", () => {
  it("gives a resource route's JSON answer its length, keeping status, headers and body", async () => {
    const body = { items: [{ sku: "MW-0.50", name: "Draht ø 0,50 mm" }] };
    const build = sizeJsonAnswers(
      buildOf({
        loader: async () =>
          Response.json(body, { status: 201, headers: { "X-Kept": "yes" } }),
      }),
    );
    const answer = (await loaderOf(build)(args)) as Response;
    const bytes = new TextEncoder().encode(JSON.stringify(body));
    expect(answer.status).toBe(201);
    expect(answer.headers.get("X-Kept")).toBe("yes");
    expect(answer.headers.get("Content-Type")).toMatch(/application\/json/);
    expect(answer.headers.get("Content-Length")).toBe(String(bytes.length));
    expect(await answer.json()).toEqual(body);
  });

  it("sizes a thrown JSON answer and throws it again", async () => {
    const build = sizeJsonAnswers(
      buildOf({
        action: async () => {
          throw Response.json({ error: { message: "No." } }, { status: 409 });
        },
      }),
    );
    const action = build.routes.route!.module.action as unknown as Handler;
    const thrown = await action(args).then(
      () => null,
      (error: unknown) => error,
    );
    expect(thrown).toBeInstanceOf(Response);
    expect((thrown as Response).status).toBe(409);
    expect((thrown as Response).headers.get("Content-Length")).toBe(
      String(JSON.stringify({ error: { message: "No." } }).length),
    );
  });

  it("leaves pages, other types and errors that are not answers alone", async () => {
    const csv = new Response("sku\nA\n", {
      headers: { "Content-Type": "text/csv" },
    });
    const csvBuild = sizeJsonAnswers(buildOf({ loader: async () => csv }));
    expect(await loaderOf(csvBuild)(args)).toBe(csv);

    const pageAnswer = Response.json({ page: true });
    const page = sizeJsonAnswers(
      buildOf({ loader: async () => pageAnswer, default: () => null }),
    );
    expect(await loaderOf(page)(args)).toBe(pageAnswer);

    const failure = new Error("broken");
    const failing = sizeJsonAnswers(
      buildOf({
        loader: async () => {
          throw failure;
        },
      }),
    );
    await expect(loaderOf(failing)(args)).rejects.toBe(failure);
  });
});
