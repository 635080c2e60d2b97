import { describe, expect, it } from "vitest";
import { pickList, type PickLineInput } from "./pick-list";

const wire: PickLineInput = {
  sku: "CU-050",
  name: "Copper 0.50 mm",
  unit: "kg",
  required: 10,
  issued: 1.5,
  held: [
    { lot: "SP-2", location: "W-2", receivedOn: "2026-03-01", quantity: 3 },
    { lot: "SP-1", location: "W-1", receivedOn: "2026-01-10", quantity: 2.25 },
    { lot: "SP-9", location: "W-9", receivedOn: "2025-12-01", quantity: 1 },
  ],
  stock: [
    {
      lot: "SP-1",
      location: "W-1",
      receivedOn: "2026-01-10",
      free: 0,
      onHold: false,
    },
    {
      lot: "SP-2",
      location: "W-2",
      receivedOn: "2026-03-01",
      free: 0,
      onHold: false,
    },
    {
      lot: "SP-9",
      location: "W-9",
      receivedOn: "2025-12-01",
      free: 4,
      onHold: true,
    },
    {
      lot: "SP-5",
      location: "W-5",
      receivedOn: "2026-05-01",
      free: 5,
      onHold: false,
    },
    {
      lot: "SP-4",
      location: "W-4",
      receivedOn: "2026-04-01",
      free: 1.1,
      onHold: false,
    },
  ],
};

describe("pickList", () => {
  it("takes the order's own lots oldest first, then free stock first in first out, never a held lot", () => {
    const [line] = pickList([wire], true);
    // 10 − 1.5 = 8.5 to issue: 2.25 (SP-1) + 3 (SP-2) held, then 1.1 (SP-4) and 2.15 of SP-5 free.
    expect(line!.toIssue).toBe(8.5);
    expect(
      line!.rows.map((row) => [
        row.lot,
        row.location,
        row.quantity,
        row.source,
      ]),
    ).toEqual([
      ["SP-1", "W-1", 2.25, "held"],
      ["SP-2", "W-2", 3, "held"],
      ["SP-4", "W-4", 1.1, "free"],
      ["SP-5", "W-5", 2.15, "free"],
    ]);
    expect(line!.short).toBe(0);
    expect(line!.heldOnHeldLots).toBe(1);
  });

  it("says what is short, leaves issued lines off, and has nothing for a closed order", () => {
    const [line] = pickList([{ ...wire, required: 20 }], true);
    // 18.5 to issue; 5.25 held + 6.1 free = 11.35; 7.15 short.
    expect(line!.short).toBe(7.15);
    expect(pickList([{ ...wire, issued: 10 }], true)).toEqual([]);
    expect(pickList([wire], false)).toEqual([]);
  });
});
