import { describe, expect, it } from "vitest";
import {
  lastValue,
  trendChartFrame,
  trendDateSpan,
  trendHighest,
  trendNameYs,
  type TrendSeries,
  writesPointValues,
} from "./trend-chart-layout";

const series: TrendSeries[] = [
  {
    key: "a",
    label: "Stock value of every magnet wire on the shelves",
    points: [
      { date: "2026-02-02", value: 120 },
      { date: "2026-01-05", value: 80 },
      { date: "2026-03-02", value: null },
    ],
  },
  { key: "b", label: "Hub", points: [{ date: "2026-01-19", value: 95.5 }] },
];

describe("trendChartFrame", () => {
  it("wraps long names and widens the right margin to hold them", () => {
    const frame = trendChartFrame(series);
    expect(frame.names[0]!.length).toBeGreaterThan(1);
    expect(frame.names[1]).toEqual(["Hub"]);
    expect(frame.nameLines).toBe(frame.names[0]!.length);
    expect(frame.innerHeight).toBe(280 - 14 - 40);
    expect(frame.width).toBe(78 + 472 + frame.margin.right);
    expect(frame.margin.right).toBeGreaterThan(
      trendChartFrame([{ ...series[1]! }]).margin.right,
    );
  });

  it("keeps a margin of 40 and one name line without series", () => {
    const frame = trendChartFrame([]);
    expect(frame.margin.right).toBe(40);
    expect(frame.nameLines).toBe(1);
  });
});

describe("trendDateSpan and trendHighest", () => {
  it("span all series' dates and take the highest value, never below 0", () => {
    expect(trendDateSpan(series)).toEqual({
      first: "2026-01-05",
      last: "2026-03-02",
    });
    expect(trendDateSpan([])).toEqual({
      first: "2000-01-01",
      last: "2000-01-01",
    });
    expect(trendHighest(series)).toBe(120);
    expect(
      trendHighest([
        { key: "n", label: "n", points: [{ date: "2026-01-01", value: -5 }] },
      ]),
    ).toBe(0);
  });
});

describe("lastValue and writesPointValues", () => {
  it("find the last valued point and count only valued points", () => {
    expect(lastValue(series[0]!.points)).toBe(80);
    expect(lastValue([{ date: "2026-01-01", value: null }])).toBeNull();
    expect(writesPointValues(series[0]!.points)).toBe(true);
    expect(
      writesPointValues(
        ["01", "02", "03", "04"].map((day) => ({
          date: `2026-01-${day}`,
          value: 1,
        })),
      ),
    ).toBe(false);
  });
});

describe("trendNameYs", () => {
  it("keeps names at their line's end when they do not meet", () => {
    expect(trendNameYs([10, 100, null], 1, 226)).toEqual([10, 100, null]);
  });

  it("moves names apart by the height of the longest name", () => {
    const [first, second] = trendNameYs([100, 101], 1, 226);
    expect(second! - first!).toBeCloseTo(14, 1);
    const [high, low] = trendNameYs([100, 101], 2, 226);
    expect(low! - high!).toBeGreaterThanOrEqual(25.9);
  });
});
