import type { ServerBuild } from "react-router";
import { describe, expect, it } from "vitest";
import { unexpectedErrorMessage } from "~/observability/error-reference";
import { runWithRequestContext } from "~/observability/request-context.server";
import { referenceUnexpectedErrors } from "./unexpected-errors";

type Loader = (args: { request: Request }) => Promise<unknown>;

/** A server build with one page route and one resource route whose loaders do `work`. */
function buildWith(work: Loader): ServerBuild {
  const route = (id: string, page: boolean) => ({
    id,
    path: id,
    module: { loader: work, ...(page ? { default: () => null } : {}) },
  });
  return {
    routes: {
      "routes/page": route("routes/page", true),
      "routes/api": route("routes/api", false),
    },
  } as unknown as ServerBuild;
}

function load(
  build: ServerBuild,
  id: string,
  request = new Request("http://localhost/x"),
) {
  const loader = build.routes[id]!.module.loader as unknown as Loader;
  return runWithRequestContext(
    { requestId: "0123456789abcdef", personId: null, display: null },
    () => loader({ request }),
  );
}

async function thrownBy(promise: Promise<unknown>): Promise<unknown> {
  try {
    await promise;
  } catch (error) {
    return error;
  }
  throw new Error("nothing was thrown");
}

describe("referenceUnexpectedErrors", () => {
  it("turns a page loader's unexpected error into a 500 carrying the request id", async () => {
    const build = referenceUnexpectedErrors(
      buildWith(async () => {
        throw new TypeError("cannot read properties of undefined");
      }),
    );
    const error = (await thrownBy(load(build, "routes/page"))) as {
      type: string;
      data: unknown;
      init: { status: number };
    };
    expect(error.type).toBe("DataWithResponseInit");
    expect(error.init.status).toBe(500);
    expect(error.data).toEqual({
      message: unexpectedErrorMessage,
      reference: "0123456789abcdef",
    });
  });

  it("leaves answers, route errors, resource routes and aborted requests alone", async () => {
    const redirect = new Response(null, {
      status: 302,
      headers: { Location: "/" },
    });
    const redirecting = referenceUnexpectedErrors(
      buildWith(async () => {
        throw redirect;
      }),
    );
    expect(await thrownBy(load(redirecting, "routes/page"))).toBe(redirect);

    const bug = new Error("a bug");
    const failing = referenceUnexpectedErrors(
      buildWith(async () => {
        throw bug;
      }),
    );
    expect(await thrownBy(load(failing, "routes/api"))).toBe(bug);
    const aborted = new AbortController();
    aborted.abort();
    expect(
      await thrownBy(
        load(
          failing,
          "routes/page",
          new Request("http://localhost/x", { signal: aborted.signal }),
        ),
      ),
    ).toBe(bug);

    const answers = referenceUnexpectedErrors(buildWith(async () => "fine"));
    expect(await load(answers, "routes/page")).toBe("fine");
  });
});
