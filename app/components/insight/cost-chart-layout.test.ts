import { describe, expect, it } from "vitest";
import {
  chartedRows,
  costAxisLabel,
  costChartFrame,
  costChartSummary,
  type CostChartRow,
  costValueText,
  perNmText,
  rowHeight,
} from "./cost-chart-layout";

const split = {
  activeCopper: 1,
  endTurnCopper: 0.5,
  leadsAndScrap: 0,
  magnets: 2,
  parts: 0.25,
};
const rows: CostChartRow[] = [
  {
    key: "1",
    label: "Hub 48 · rev 2",
    costPerNm: 3.75,
    splitPerNm: split,
    complete: true,
  },
  {
    key: "2",
    label: "Pump · rev 1",
    costPerNm: null,
    splitPerNm: null,
    complete: true,
  },
  {
    key: "3",
    label: "Credit · rev 1",
    costPerNm: 4,
    splitPerNm: null,
    complete: true,
  },
];

describe("texts", () => {
  it("writes a cost per N·m with its currency, and says when there is no torque", () => {
    expect(perNmText(3.75, "EUR")).toBe("3.75\u00a0EUR/N·m");
    expect(costValueText(rows[0]!, "EUR")).toBe("3.75\u00a0EUR/N·m");
    expect(costValueText(rows[1]!, "EUR")).toBe("no rated torque");
    expect(costAxisLabel("EUR", "best current supplier price")).toBe(
      "EUR per N·m, at the best current supplier price",
    );
  });
});

describe("chartedRows", () => {
  it("keeps only rows with both a split and a cost per N·m", () => {
    expect(chartedRows(rows).map((row) => row.key)).toEqual(["1"]);
  });
});

describe("costChartFrame", () => {
  it("is 600 wide with a row per design, and one row's height without any", () => {
    const frame = costChartFrame(rows, "EUR", "best current supplier price");
    expect(frame.width).toBe(600);
    expect(frame.innerWidth).toBe(600 - frame.margin.left - frame.margin.right);
    expect(frame.innerHeight).toBe(3 * rowHeight);
    expect(frame.height).toBe(4 + 44 + 3 * rowHeight);
    expect(costChartFrame([], "EUR", "x").innerHeight).toBe(rowHeight);
  });

  it("grows for a name longer than a row", () => {
    const long = costChartFrame(
      [{ ...rows[0]!, label: "A motor name ".repeat(12) }],
      "EUR",
      "x",
    );
    expect(long.width).toBeGreaterThan(600);
  });
});

describe("costChartSummary", () => {
  const parts = [
    { key: "activeCopper" as const, label: "Active copper" },
    { key: "magnets" as const, label: "Magnets" },
  ];
  it("reads each charted design with its parts", () => {
    expect(costChartSummary(chartedRows(rows), "EUR", parts)).toBe(
      "Hub 48 · rev 2: 3.75\u00a0EUR/N·m, of which active copper 1.00\u00a0EUR/N·m, magnets 2.00\u00a0EUR/N·m.",
    );
  });
  it("says so when no design is charted", () => {
    expect(costChartSummary([], "EUR", parts)).toBe(
      "No design has a cost per N·m yet.",
    );
  });
});
