/**
 * Runs an API route's long work inside a streamed answer (progress-stream.ts):
 * progress events while it runs, then its JSON answer as the `result` event.
 * The route checks the role, the body's size and its fields before calling
 * this, so those refusals keep their own status; once the stream has started
 * its HTTP status is 200 and the `result` event carries the real one.
 *
 * When the client goes away, the next progress report throws and the work
 * stops there: a commit rolls back as it does for any error.
 */
import { setImmediate as nextTurn } from "node:timers/promises";
import { unexpectedErrorMessage } from "~/observability/error-reference";
import { logServerError } from "~/observability/logger.server";
import { currentRequest } from "~/observability/request-context.server";
import {
  encodeProgressEvent,
  progressStreamType,
  ProgressPacer,
  type ProgressEvent,
  type ProgressStep,
} from "./progress-stream";

/** Reports rows processed out of the total; awaited, so the event goes out before the work goes on. */
export type ReportProgress = (
  processed: number,
  total: number,
) => Promise<void>;

/** True when the request asks for progress as a stream (`Accept: application/x-ndjson`). */
export function wantsProgressStream(request: Request): boolean {
  return (request.headers.get("Accept") ?? "")
    .split(",")
    .some(
      (entry) =>
        entry.split(";")[0]!.trim().toLowerCase() === progressStreamType,
    );
}

class ClientGone extends Error {
  constructor() {
    super("The client stopped reading the progress stream.");
  }
}

export function progressStreamAnswer(
  request: Request,
  step: ProgressStep,
  work: (report: ReportProgress) => Promise<Response>,
): Response {
  const encoder = new TextEncoder();
  const pacer = new ProgressPacer();
  let gone = false;
  const stream = new ReadableStream<Uint8Array>({
    start(controller) {
      const send = (event: ProgressEvent) =>
        controller.enqueue(encoder.encode(encodeProgressEvent(event)));
      const report: ReportProgress = async (processed, total) => {
        if (gone || request.signal.aborted) throw new ClientGone();
        if (!pacer.shouldSend(processed, total, performance.now())) return;
        send({ type: "progress", step, processed, total });
        // Rows are read and checked without waiting for anything: let the line go out now.
        await nextTurn();
      };
      void (async () => {
        let answer: Response;
        try {
          answer = await work(report);
        } catch (error) {
          if (gone || error instanceof ClientGone) {
            if (!gone) controller.close();
            return;
          }
          logServerError(error, "streamed work failed");
          answer = Response.json(
            {
              error: { message: unexpectedErrorMessage },
              reference: currentRequest()?.requestId ?? null,
            },
            { status: 500 },
          );
        }
        if (gone) return;
        send({
          type: "result",
          status: answer.status,
          body: await answer.json(),
        });
        controller.close();
      })();
    },
    cancel() {
      gone = true;
    },
  });
  return new Response(stream, {
    status: 200,
    headers: {
      "Content-Type": `${progressStreamType}; charset=utf-8`,
      // Never held back by the compression middleware or a proxy: each line is news.
      "Cache-Control": "no-store, no-transform",
      "X-Accel-Buffering": "no",
    },
  });
}
