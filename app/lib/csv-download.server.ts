/**
 * A CSV file as a download: whole (a short list) or streamed a part at a time (a long
 * export, written as the database is read, so the server never holds the whole file).
 * Never cached: exports are private answers.
 */
import type { z } from "zod";

export function csvDownload(
  body: string | AsyncIterable<string>,
  filename: string,
  headers: Record<string, string> = {},
): Response {
  return new Response(typeof body === "string" ? body : streamOf(body), {
    headers: {
      "Content-Type": "text/csv; charset=utf-8",
      "Content-Disposition": `attachment; filename="${filename}"`,
      "Cache-Control": "no-store",
      ...headers,
    },
  });
}

/** The text parts as a byte stream, one read from the source for each pull. */
function streamOf(parts: AsyncIterable<string>): ReadableStream<Uint8Array> {
  const iterator = parts[Symbol.asyncIterator]();
  const encoder = new TextEncoder();
  return new ReadableStream<Uint8Array>({
    async pull(controller) {
      const next = await iterator.next();
      if (next.done) controller.close();
      else controller.enqueue(encoder.encode(next.value));
    },
    async cancel() {
      await iterator.return?.();
    },
  });
}

/** 400 for an export whose filters in the address are wrong, naming each. */
export function csvFilterRefusal(error: z.ZodError): Response {
  const problems = error.issues.map(
    (issue) => `${issue.path.join(".")}: ${issue.message}`,
  );
  return new Response(
    `The export's filters are wrong.\n${problems.join("\n")}\n`,
    { status: 400, headers: { "Content-Type": "text/plain; charset=utf-8" } },
  );
}
