import { describe, expect, it } from "vitest";
import {
  LineErrorList,
  maxListedLineErrors,
  mergeLineErrors,
  moreLineErrorsText,
} from "./line-errors";
import { lineError } from "./parse-price-list";

describe("line errors", () => {
  it("lists the first 1,000 lines added and counts them all", () => {
    const list = new LineErrorList();
    for (let line = 2; line < 1_000_002; line += 1)
      list.add(lineError(line, "bad."));
    expect(list.errors).toHaveLength(maxListedLineErrors);
    expect(list.errors.at(-1)!.line).toBe(1_001);
    expect(list.errorCount).toBe(1_000_000);
  });

  it("merges the lists of several readers into the first lines of the file", () => {
    const broken = new LineErrorList();
    const badValues = new LineErrorList();
    for (let line = 2; line < 3_002; line += 1)
      (line % 2 === 0 ? broken : badValues).add(lineError(line, "bad."));
    const merged = mergeLineErrors(broken, badValues);
    expect(merged.errorCount).toBe(3_000);
    expect(merged.errors.map((error) => error.line)).toEqual(
      Array.from({ length: 1_000 }, (_, index) => index + 2),
    );
  });

  it("says how many more lines there were", () => {
    expect(moreLineErrorsText(1_000, 124_456)).toBe(
      "… and 123,456 more lines with errors",
    );
    expect(moreLineErrorsText(1_000, 1_001)).toBe(
      "… and 1 more line with errors",
    );
    expect(moreLineErrorsText(3, 3)).toBeNull();
  });
});
