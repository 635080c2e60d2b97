import { describe, expect, it } from "vitest";
import { z } from "zod";
import {
  formatKeysetCursor,
  keysetCursorParam,
  parseKeysetCursor,
} from "./keyset-cursor";

describe("keyset cursors", () => {
  it("write a row's time to the millisecond and its id, and read them back", () => {
    const row = { at: new Date("2026-11-30T08:15:02.123Z"), id: 98765 };
    const text = formatKeysetCursor(row);
    expect(text).toBe("1796026502123-98765");
    expect(parseKeysetCursor(text)).toEqual(row);
  });

  it("refuse what no answer gave", () => {
    for (const text of [
      "",
      "98765",
      "1764490502123-",
      "-5",
      "1.5-3",
      "17644905021234567-1",
      "a-b",
    ])
      expect(parseKeysetCursor(text)).toBeNull();
  });

  it("are refused in the address with a message naming the parameter", () => {
    const schema = z.object({
      after: keysetCursorParam("after", "d").optional(),
    });
    const refused = schema.safeParse({ after: "page-2" });
    expect(refused.success).toBe(false);
    expect(refused.error?.issues[0]?.message).toMatch(
      /^after must be a cursor/,
    );
    expect(schema.parse({ after: "1000-7" }).after).toEqual({
      at: new Date(1000),
      id: 7,
    });
  });
});
