import { describe, expect, it } from "vitest";
import { issueTotals } from "./issue-totals";

const at = (minute: number) => new Date(Date.UTC(2026, 11, 1, 8, minute));

describe("issueTotals", () => {
  it("sums issues net of returns per build order, exactly", () => {
    // Worked by hand: order 7 takes 1.250 kg and 0.400 kg and brings back 0.150 kg:
    // issued 1.650 kg, returned 0.150 kg, net 1.500 kg. Order 9 takes 2.000 kg.
    const totals = issueTotals([
      { key: 7, type: "issue", quantity: -1250n, at: at(0) },
      { key: 9, type: "issue", quantity: -2000n, at: at(5) },
      { key: 7, type: "issue", quantity: -400n, at: at(10) },
      { key: 7, type: "return", quantity: 150n, at: at(20) },
    ]);
    expect(totals).toEqual([
      {
        key: 7,
        issued: 1650n,
        returned: 150n,
        net: 1500n,
        firstIssuedAt: at(0),
        lastMovementAt: at(20),
      },
      {
        key: 9,
        issued: 2000n,
        returned: 0n,
        net: 2000n,
        firstIssuedAt: at(5),
        lastMovementAt: at(5),
      },
    ]);
  });

  it("keeps 0.1 + 0.2 exact in thousandths (0.300, where binary floats give 0.30000000000000004)", () => {
    const [total] = issueTotals([
      { key: 1, type: "issue", quantity: -100n, at: at(0) },
      { key: 1, type: "issue", quantity: -200n, at: at(1) },
    ]);
    expect(total!.issued).toBe(300n);
  });

  it("lists an order that only returned stock with no first issue, in the order of first movement", () => {
    const totals = issueTotals([
      { key: 3, type: "return", quantity: 500n, at: at(30) },
      { key: 2, type: "issue", quantity: -100n, at: at(40) },
      { key: 2, type: "issue", quantity: -100n, at: at(1) },
    ]);
    expect(totals.map((total) => total.key)).toEqual([2, 3]);
    expect(totals[0]!.firstIssuedAt).toEqual(at(1));
    expect(totals[0]!.lastMovementAt).toEqual(at(40));
    expect(totals[1]).toMatchObject({
      issued: 0n,
      returned: 500n,
      net: -500n,
      firstIssuedAt: null,
    });
  });
});
