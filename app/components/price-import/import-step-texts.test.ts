import { describe, expect, it } from "vitest";
import {
  fixRowsText,
  importButtonText,
  importNoteText,
} from "./import-step-texts";

const good = { valid: 1200, invalidCount: 0, newItems: 3 };

describe("the import step's texts", () => {
  it("asks to fix the rows with problems, counted with thousands separators", () => {
    expect(fixRowsText(good)).toBe("");
    expect(fixRowsText({ ...good, invalidCount: 1 })).toBe(
      " Fix the row with problems in the file, choose it again and check again.",
    );
    expect(fixRowsText({ ...good, invalidCount: 1500 })).toBe(
      " Fix the 1,500 rows with problems in the file, choose it again and check again.",
    );
  });

  it("names the rows the button imports", () => {
    expect(importButtonText(good, false)).toBe("Import 1,200 rows");
    expect(importButtonText({ ...good, valid: 1 }, false)).toBe("Import 1 row");
    expect(importButtonText(good, true)).toBe("Importing…");
  });

  it("says for whom, how many new items, or why not", () => {
    expect(importNoteText(good, "Wirewell")).toBe(
      "For Wirewell; 3 new catalogue items will be created.",
    );
    expect(importNoteText({ ...good, newItems: 1 }, undefined)).toBe(
      "For the supplier; 1 new catalogue item will be created.",
    );
    expect(importNoteText({ ...good, invalidCount: 2 }, "Wirewell")).toBe(
      "Not possible while rows have problems.",
    );
  });
});
