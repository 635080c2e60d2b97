import { describe, expect, it } from "vitest";
import { z } from "zod";
import {
  dayParam,
  idFromText,
  maxPage,
  pageFromSearch,
  pageParam,
  pageSizeParam,
  positiveDecimalParam,
  readPageOrLast,
  readSearchLeniently,
  searchParamsObject,
  wholeNumberParam,
} from "./search-params";

const query = z.object({
  page: pageParam,
  pageSize: pageSizeParam("pageSize", 500, 50),
  from: dayParam("from").optional(),
});

const read = (text: string) =>
  query.safeParse(searchParamsObject(new URLSearchParams(text)));

describe("numbers from the address for the API", () => {
  it("reads pages and sizes written in digits, with defaults", () => {
    expect(read("").data).toEqual({ page: 1, pageSize: 50 });
    expect(read("page=3&pageSize=500&from=2025-02-28").data).toEqual({
      page: 3,
      pageSize: 500,
      from: "2025-02-28",
    });
    expect(read(`page=${maxPage}`).data?.page).toBe(maxPage);
  });

  it.each([
    "1e300",
    "99999999999999999999",
    "-1",
    "0",
    "1.5",
    "abc",
    "Infinity",
    "0x10",
    "1e3",
    " ",
    String(maxPage + 1),
    "1".repeat(1_000_000),
  ])("refuses the page %s with a message naming it and its range", (value) => {
    const parsed = query.safeParse({ page: value });
    expect(parsed.success).toBe(false);
    expect(parsed.error!.issues.map((issue) => issue.path)).toEqual([["page"]]);
    expect(parsed.error!.issues[0]!.message).toBe(
      "page must be a whole number from 1 to 1,000,000.",
    );
  });

  it("refuses a page size beyond its maximum", () => {
    expect(read("pageSize=501").error!.issues[0]!.message).toBe(
      "pageSize must be a whole number from 1 to 500.",
    );
    expect(read("pageSize=1000000000").success).toBe(false);
  });

  it.each(["2025-02-30", "2025-13-01", "99999-01-01", "1e300", "today"])(
    "refuses the day %s",
    (value) => {
      expect(read(`from=${value}`).error!.issues[0]!.message).toBe(
        "from must be a day written YYYY-MM-DD.",
      );
    },
  );

  it("takes a message of its own", () => {
    const motors = wholeNumberParam("quantity", {
      min: 1,
      max: 10,
      message: "Between 1 and 10 motors.",
    });
    expect(motors.safeParse("11").error!.issues[0]!.message).toBe(
      "Between 1 and 10 motors.",
    );
  });

  it("reads a decimal above 0 with a bounded number of places", () => {
    const quantity = positiveDecimalParam("quantity", {
      max: 1_000,
      decimals: 3,
    });
    expect(quantity.parse("2.5")).toBe(2.5);
    expect(quantity.parse("1000")).toBe(1000);
    for (const bad of ["0", "0.0001", "1000.001", "-1", "1e3", "1,5", "abc"])
      expect(quantity.safeParse(bad).success, bad).toBe(false);
  });
});

describe("ids from the address", () => {
  it("reads whole numbers from 1 to the largest stored id", () => {
    expect(idFromText("42")).toBe(42);
    expect(idFromText("2147483647")).toBe(2_147_483_647);
    for (const bad of [
      "0",
      "-1",
      "1e300",
      "2147483648",
      "99999999999999999999",
      "1.0",
      "",
      null,
      undefined,
    ])
      expect(idFromText(bad), String(bad)).toBeNull();
  });
});

describe("pages correct what they cannot use", () => {
  it.each([
    ["3", 3],
    [null, 1],
    ["", 1],
    ["0", 1],
    ["-2", 1],
    ["2.5", 1],
    ["abc", 1],
    ["1e300", maxPage],
    ["Infinity", maxPage],
    ["99999999999999999999", maxPage],
    ["1".repeat(1_000_000), 1],
  ])("reads %s as page %d", (value, page) => {
    expect(pageFromSearch(value)).toBe(page);
  });

  it("reads a page past the end as the last page", async () => {
    const rows = Array.from({ length: 45 }, (_, index) => index + 1);
    const pagesRead: number[] = [];
    const listPage = async (page: number) => {
      pagesRead.push(page);
      return {
        total: rows.length,
        rows: rows.slice((page - 1) * 20, page * 20),
      };
    };
    expect(await readPageOrLast(2, 20, listPage)).toMatchObject({
      page: 2,
      pageCount: 3,
      rows: rows.slice(20, 40),
    });
    expect(await readPageOrLast(maxPage, 20, listPage)).toMatchObject({
      page: 3,
      pageCount: 3,
      rows: [41, 42, 43, 44, 45],
    });
    expect(pagesRead).toEqual([2, maxPage, 3]);
    const empty = await readPageOrLast(7, 20, async () => ({ total: 0 }));
    expect(empty).toMatchObject({ page: 1, pageCount: 1 });
  });

  it("leaves out what the schema refuses and names it, keeping the rest", () => {
    const { query: read, errors } = readSearchLeniently(query, {
      page: "1e300",
      pageSize: "1000000000",
      from: "2025-02-30",
    });
    expect(read).toEqual({ page: maxPage, pageSize: 50 });
    expect(errors).toEqual({
      pageSize: ["pageSize must be a whole number from 1 to 500."],
      from: ["from must be a day written YYYY-MM-DD."],
    });
  });
});
