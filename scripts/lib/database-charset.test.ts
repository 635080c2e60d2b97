import { describe, expect, it } from "vitest";
import { charsetPlan } from "./database-charset";

const database = "shop";
const empty = { database, tables: [] };

describe("charsetPlan", () => {
  it("sets a latin1 database's default to utf8mb4 before the first table", () => {
    // latin1_swedish_ci is a stock MariaDB 10.11's default (character_set_server).
    expect(
      charsetPlan({
        ...empty,
        defaultCharset: "latin1",
        defaultCollation: "latin1_swedish_ci",
      }),
    ).toEqual({ kind: "set-default", collation: "utf8mb4_unicode_ci" });
  });

  it("leaves an empty utf8mb4 database with the collation its owner chose", () => {
    expect(
      charsetPlan({
        ...empty,
        defaultCharset: "utf8mb4",
        defaultCollation: "utf8mb4_general_ci",
      }),
    ).toEqual({ kind: "ready" });
  });

  it("makes new tables match existing utf8mb4 ones", () => {
    const tables = [
      { name: "users", collation: "utf8mb4_unicode_ci" },
      { name: "items", collation: "utf8mb4_unicode_ci" },
    ];
    expect(
      charsetPlan({
        database,
        defaultCharset: "utf8mb4",
        defaultCollation: "utf8mb4_unicode_ci",
        tables,
      }),
    ).toEqual({ kind: "ready" });
    expect(
      charsetPlan({
        database,
        defaultCharset: "latin1",
        defaultCollation: "latin1_swedish_ci",
        tables,
      }),
    ).toEqual({ kind: "set-default", collation: "utf8mb4_unicode_ci" });
  });

  it("refuses a database that holds tables in another character set, saying how to create one", () => {
    const plan = charsetPlan({
      database,
      defaultCharset: "latin1",
      defaultCollation: "latin1_swedish_ci",
      tables: [
        { name: "users", collation: "latin1_swedish_ci" },
        { name: "items", collation: "utf8mb4_unicode_ci" },
      ],
    });
    expect(plan.kind).toBe("refuse");
    const message = plan.kind === "refuse" ? plan.message : "";
    expect(message).toContain("users (latin1_swedish_ci)");
    expect(message).not.toContain("items");
    expect(message).toContain(
      "CREATE DATABASE `turnledger` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci",
    );
  });
});
