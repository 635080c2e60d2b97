/**
 * JSON answers of resource routes (the API) go out with their Content-Length.
 *
 * `Response.json(…)` carries no Content-Length, so React Router's Express adapter writes
 * its body as a stream: chunked transfer encoding, and the compression middleware, which
 * only sees a stream, cannot tell a 200-byte answer from a 2 MB one and gzips every
 * answer whatever its size (a fresh zlib stream per request; its 1 KB threshold applies
 * only to answers of known length). A JSON answer is already whole in memory, so each
 * resource route's returned or thrown JSON Response is given its length here: answers
 * under the threshold go out as they are, larger ones are still compressed.
 * Pages and their .data requests are React Router's own and are not touched; nor is an
 * answer that already has a length or an encoding, or any other type (CSV, streams).
 *
 * Hook (server/app.ts): the last of the wrappers of the server build, so the answers of
 * the others (a 503 of server/database-unavailable.ts) are sized too.
 */
import {
  wrapRouteHandlers,
  type RouteHandler as Handler,
} from "./route-handler-wrapping";

/** Whether an answer is a JSON body of unknown length that may be read whole. */
function unsizedJson(answer: unknown): answer is Response {
  return (
    answer instanceof Response &&
    answer.body !== null &&
    !answer.bodyUsed &&
    !answer.headers.has("Content-Length") &&
    !answer.headers.has("Content-Encoding") &&
    /^application\/(?:[\w.+-]+\+)?json\b/i.test(
      answer.headers.get("Content-Type") ?? "",
    )
  );
}

/** The same answer with its body read whole and its Content-Length set. */
export async function sizedAnswer(answer: Response): Promise<Response> {
  const body = new Uint8Array(await answer.arrayBuffer());
  const headers = new Headers(answer.headers);
  headers.set("Content-Length", String(body.byteLength));
  return new Response(body, {
    status: answer.status,
    statusText: answer.statusText,
    headers,
  });
}

function sizing(handler: Handler): Handler {
  return async (args) => {
    let answer: unknown;
    try {
      answer = await handler(args);
    } catch (error) {
      throw unsizedJson(error) ? await sizedAnswer(error) : error;
    }
    return unsizedJson(answer) ? sizedAnswer(answer) : answer;
  };
}

/** The build with every resource route's loader and action answering sized JSON. */
export const sizeJsonAnswers = wrapRouteHandlers(
  (handler, { resourceRoute }) => (resourceRoute ? sizing(handler) : handler),
);
