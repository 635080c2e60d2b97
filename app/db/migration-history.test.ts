import { describe, expect, it } from "vitest";
import { compareMigrations, schemaProblem } from "./migration-history";

const m = (hash: string, createdAt: number) => ({ hash, createdAt });
const known = [m("a", 1), m("b", 2), m("c", 3)];

describe("compareMigrations", () => {
  it("finds the same migrations current", () => {
    expect(compareMigrations(known, known)).toEqual({ kind: "current" });
  });
  it("finds a prefix older, with how many remain", () => {
    expect(compareMigrations([m("a", 1)], known)).toEqual({
      kind: "older",
      remaining: 2,
    });
    expect(compareMigrations([], known)).toEqual({
      kind: "older",
      remaining: 3,
    });
  });
  it("finds more migrations than this version knows newer", () => {
    expect(compareMigrations([...known, m("d", 4)], known)).toEqual({
      kind: "newer",
      applied: 4,
      known: 3,
    });
  });
  it("finds a different migration (contents or time) foreign", () => {
    expect(compareMigrations([m("a", 1), m("x", 2)], known)).toEqual({
      kind: "foreign",
      firstDifferent: 1,
    });
    expect(compareMigrations([m("a", 9)], known)).toEqual({
      kind: "foreign",
      firstDifferent: 0,
    });
  });
});

describe("schemaProblem", () => {
  it("has nothing to say about a current database", () => {
    expect(schemaProblem({ kind: "current", applied: 3, known: 3 })).toBeNull();
  });
  it("counts what a database behind has, and names the command", () => {
    const behind = schemaProblem({
      kind: "older",
      remaining: 2,
      applied: 12,
      known: 14,
    });
    expect(behind).toContain(
      "The database has 12 of this version's 14 migrations",
    );
    expect(behind).toContain("npm run db:migrate");
    expect(
      schemaProblem({ kind: "older", remaining: 14, applied: 0, known: 14 }),
    ).toContain("none of this version's 14 migrations");
  });
  it("says a database ahead was migrated by a newer Turnledger", () => {
    const ahead = schemaProblem({
      kind: "newer",
      applied: 15,
      known: 14,
    });
    expect(ahead).toContain("migrated by a newer Turnledger");
    expect(ahead).toContain("15 migrations, this version knows 14");
    expect(ahead).not.toContain("db:migrate");
  });
  it("names the first migration that is not this version's", () => {
    expect(
      schemaProblem({
        kind: "foreign",
        firstDifferent: 4,
        applied: 14,
        known: 14,
      }),
    ).toContain("migration 5 is not this version's");
  });
});
