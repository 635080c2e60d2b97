import { describe, expect, it } from "vitest";
import {
  encodeProgressEvent,
  ProgressLineReader,
  ProgressPacer,
  type ProgressEvent,
} from "./progress-stream";

describe("reading a progress stream", () => {
  it("answers each event once its line is complete, however the text is cut", () => {
    const events: ProgressEvent[] = [
      { type: "progress", step: "check", processed: 0, total: 3 },
      { type: "progress", step: "check", processed: 3, total: 3 },
      { type: "result", status: 200, body: { valid: 3 } },
    ];
    const text = events.map(encodeProgressEvent).join("");
    for (const cut of [1, 7, 40, text.length - 1]) {
      const reader = new ProgressLineReader();
      const read = [
        ...reader.push(text.slice(0, cut)),
        ...reader.push(text.slice(cut)),
      ];
      expect(read, `cut at ${cut}`).toEqual(events);
    }
  });

  it("passes over lines that are not events", () => {
    const reader = new ProgressLineReader();
    expect(
      reader.push(
        'not json\n{"type":"other"}\n\n{"type":"result","status":422,"body":null}\n',
      ),
    ).toEqual([{ type: "result", status: 422, body: null }]);
  });
});

describe("pacing progress events", () => {
  it("sends the first and the last, and in between every 10,000 rows or 250 ms", () => {
    const pacer = new ProgressPacer(10_000, 250);
    const sent = (processed: number, now: number) =>
      pacer.shouldSend(processed, 100_000, now);
    expect(sent(0, 0)).toBe(true);
    expect(sent(2_000, 40)).toBe(false);
    expect(sent(8_000, 160)).toBe(false);
    expect(sent(10_000, 200)).toBe(true); // 10,000 rows since the last event
    expect(sent(12_000, 300)).toBe(false);
    expect(sent(14_000, 450)).toBe(true); // 250 ms since the last event
    expect(sent(100_000, 460)).toBe(true); // the last
  });

  it("never sends a count lower than one already sent (work started over)", () => {
    const pacer = new ProgressPacer(10_000, 250);
    expect(pacer.shouldSend(0, 50_000, 0)).toBe(true);
    expect(pacer.shouldSend(20_000, 50_000, 1_000)).toBe(true);
    expect(pacer.shouldSend(0, 50_000, 2_000)).toBe(false);
    expect(pacer.shouldSend(20_000, 50_000, 3_000)).toBe(false);
    expect(pacer.shouldSend(22_000, 50_000, 4_000)).toBe(true);
  });
});
