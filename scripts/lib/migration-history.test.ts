import { describe, expect, it } from "vitest";
import { compareMigrations } from "./migration-history";

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
