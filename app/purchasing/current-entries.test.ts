import { describe, expect, it } from "vitest";
import { entriesInForce } from "./current-entries";

const base = [
  { conductor: "copper", currency: "EUR", validFrom: "2026-03-01", price: 9.1 },
  { conductor: "copper", currency: "EUR", validFrom: "2026-02-01", price: 8.7 },
  { conductor: "copper", currency: "EUR", validFrom: "2026-04-01", price: 9.9 },
  {
    conductor: "aluminium",
    currency: "EUR",
    validFrom: "2026-01-15",
    price: 2.4,
  },
  { conductor: "copper", currency: "USD", validFrom: "2026-05-01", price: 10 },
];
const key = (entry: (typeof base)[number]) =>
  `${entry.conductor} ${entry.currency}`;

describe("entriesInForce", () => {
  it("keeps the latest entry per key that has started", () => {
    expect(
      entriesInForce(base, key, "2026-03-15").map((entry) => entry.price),
    ).toEqual([2.4, 9.1]);
  });

  it("counts an entry dated today as in force", () => {
    expect(
      entriesInForce(base, key, "2026-04-01").map((entry) => entry.price),
    ).toEqual([2.4, 9.9]);
  });

  it("leaves out keys whose entries all start later", () => {
    expect(entriesInForce(base, key, "2026-01-01")).toEqual([]);
  });
});
