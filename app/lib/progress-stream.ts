/**
 * Progress of long work, streamed from the server as newline-delimited JSON
 * (`application/x-ndjson`, one event a line): `progress` events with the rows
 * processed out of the total while the work runs, then one `result` event
 * with the status and JSON body the same request would have answered without
 * the stream. A client opts in with `Accept: application/x-ndjson`; without
 * it, the route answers as it always did. Decision 041.
 *
 * Pure: the server writes events with it (progress-stream.server.ts), the
 * page and the bench read them.
 */

export const progressStreamType = "application/x-ndjson";

/** Which work the rows are counted for. */
export type ProgressStep = "check" | "import";

export interface RowProgress {
  step: ProgressStep;
  /** Rows processed so far: never less than in the event before. */
  processed: number;
  /** Rows the work has in all. */
  total: number;
}

export type ProgressEvent =
  | ({ type: "progress" } & RowProgress)
  | {
      type: "result";
      /** The HTTP status the answer would have had without the stream. */
      status: number;
      body: unknown;
    };

export function encodeProgressEvent(event: ProgressEvent): string {
  return `${JSON.stringify(event)}\n`;
}

function isProgressEvent(value: unknown): value is ProgressEvent {
  if (typeof value !== "object" || value === null) return false;
  const event = value as Record<string, unknown>;
  if (event.type === "result") return typeof event.status === "number";
  return (
    event.type === "progress" &&
    (event.step === "check" || event.step === "import") &&
    typeof event.processed === "number" &&
    typeof event.total === "number"
  );
}

/**
 * Reads a stream's text as it arrives, in pieces cut anywhere: answers the
 * events of the lines completed so far. A line that is not an event is passed
 * over.
 */
export class ProgressLineReader {
  private pending = "";

  /** Adds the text that arrived; answers the events it completed. */
  push(text: string): ProgressEvent[] {
    const lines = (this.pending + text).split("\n");
    this.pending = lines.pop() ?? "";
    const events: ProgressEvent[] = [];
    for (const line of lines) {
      if (line.trim() === "") continue;
      try {
        const parsed: unknown = JSON.parse(line);
        if (isProgressEvent(parsed)) events.push(parsed);
      } catch {
        // Not an event: nothing to show for it.
      }
    }
    return events;
  }
}

/**
 * Decides which progress reports become events: the first, the last (all rows
 * done), and in between one whenever `everyRows` rows or `everyMs`
 * milliseconds have passed since the last event, whichever comes first. A
 * report of fewer rows than already sent (work started over after a write
 * conflict) is held back until it passes them, so the counts never go down.
 */
export class ProgressPacer {
  private sentRows = -1;
  private sentAt = -Infinity;

  constructor(
    private readonly everyRows = 10_000,
    private readonly everyMs = 250,
  ) {}

  shouldSend(processed: number, total: number, now: number): boolean {
    if (this.sentRows >= 0 && processed <= this.sentRows) return false;
    const send =
      this.sentRows < 0 ||
      processed >= total ||
      processed - this.sentRows >= this.everyRows ||
      now - this.sentAt >= this.everyMs;
    if (send) {
      this.sentRows = processed;
      this.sentAt = now;
    }
    return send;
  }
}

/** An event with when it arrived (performance.now(), ms). */
export type TimedProgressEvent = ProgressEvent & { at: number };

/**
 * Reads a whole streamed answer with fetch's body reader (scripts, the bench,
 * tests): every event in order with its arrival time. The page reads the same
 * lines from XMLHttpRequest instead, which also reports the upload.
 */
export async function readProgressStream(
  response: Response,
  onEvent: (event: TimedProgressEvent) => void = () => undefined,
): Promise<TimedProgressEvent[]> {
  const events: TimedProgressEvent[] = [];
  const lines = new ProgressLineReader();
  const decoder = new TextDecoder();
  const reader = response.body?.getReader();
  if (!reader) return events;
  for (;;) {
    const { done, value } = await reader.read();
    const text = done
      ? decoder.decode()
      : decoder.decode(value, { stream: true });
    const at = performance.now();
    for (const event of lines.push(done ? `${text}\n` : text)) {
      const timed = { ...event, at };
      events.push(timed);
      onEvent(timed);
    }
    if (done) return events;
  }
}
