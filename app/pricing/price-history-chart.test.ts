import { describe, expect, it } from "vitest";
import {
  markerPath,
  priceHistoryChart,
  seriesStyle,
  spreadLabels,
  valueAxis,
  type ChartFrame,
} from "./price-history-chart";

// Plot area x 50…350 (300 px wide), y 10…170 (160 px tall): round numbers for sums by hand.
const frame: ChartFrame = {
  width: 500,
  height: 200,
  left: 50,
  right: 150,
  top: 10,
  bottom: 30,
};

describe("price-history chart layout", () => {
  it("draws a price change as a step that holds until the next point and on to today (worked by hand)", () => {
    const chart = priceHistoryChart(
      [
        {
          points: [
            { date: "2026-11-01", unitPrice: 2.15 },
            { date: "2026-11-21", unitPrice: 2.4 },
          ],
        },
      ],
      "2026-12-01",
      frame,
    )!;
    // 30 days across 300 px: 2026-11-21 is day 20 → 50 + 200 = 250; today at 350.
    // Prices 2.15…2.40 on a 0.1 step: axis 2.1…2.5 (2.40 on a tick gets a step above);
    // 2.15 → 170 − 0.05/0.4 × 160 = 150, 2.40 → 170 − 0.3/0.4 × 160 = 50.
    expect(chart.series[0]!.path).toBe("M50,150 H250 V50 H350");
    expect(chart.series[0]!.markers).toEqual([
      { x: 50, y: 150, date: "2026-11-01", unitPrice: 2.15 },
      { x: 250, y: 50, date: "2026-11-21", unitPrice: 2.4 },
    ]);
    expect(chart.series[0]!.endY).toBe(50);
    expect(chart.series[0]!.labelY).toBe(50);
    expect(chart.valueTicks).toEqual([
      { value: 2.1, y: 170 },
      { value: 2.2, y: 130 },
      { value: 2.3, y: 90 },
      { value: 2.4, y: 50 },
      { value: 2.5, y: 10 },
    ]);
    expect(chart.valueDecimals).toBe(1);
    // Two month starts only: the first, middle (day 15) and last day instead.
    expect(chart.monthTicks).toBe(false);
    expect(chart.dateTicks).toEqual([
      { date: "2026-11-01", x: 50, anchor: "start" },
      { date: "2026-11-16", x: 200, anchor: "middle" },
      { date: "2026-12-01", x: 350, anchor: "end" },
    ]);
    expect([chart.start, chart.end]).toEqual(["2026-11-01", "2026-12-01"]);
  });

  it("breaks the line on the days with no price instead of drawing through them (worked by hand)", () => {
    const chart = priceHistoryChart(
      [
        {
          points: [
            { date: "2026-11-01", unitPrice: null },
            { date: "2026-11-11", unitPrice: 10 },
            { date: "2026-11-21", unitPrice: null },
          ],
        },
        { points: [{ date: "2026-11-01", unitPrice: 12 }] },
      ],
      "2026-12-01",
      frame,
    )!;
    // Prices 10…12 on a 0.5 step, padded to 9.5…12.5: 10 → 170 − 0.5/3 × 160 = 143.3,
    // 12 → 170 − 2.5/3 × 160 = 36.7. 2026-11-11 is day 10 → 150; 2026-11-21 → 250.
    expect(chart.series[0]!.path).toBe("M150,143.3 H250");
    expect(chart.series[0]!.markers.map((marker) => marker.x)).toEqual([150]);
    expect(chart.series[0]!.endY).toBe(143.3);
    expect(chart.series[1]!.path).toBe("M50,36.7 H350");
    expect(chart.valueTicks.map((tick) => tick.value)).toEqual([
      9.5, 10, 10.5, 11, 11.5, 12, 12.5,
    ]);
  });

  it("keeps an offer that never had a price in the window, with nothing to draw", () => {
    const chart = priceHistoryChart(
      [
        { points: [{ date: "2026-11-01", unitPrice: null }] },
        { points: [{ date: "2026-11-01", unitPrice: 3 }] },
      ],
      "2026-12-01",
      frame,
    )!;
    expect(chart.series[0]).toMatchObject({
      path: "",
      markers: [],
      endY: null,
      labelY: null,
    });
    expect(chart.series[1]!.path).not.toBe("");
  });

  it("is null when no offer has a price on any day shown", () => {
    expect(
      priceHistoryChart(
        [{ points: [{ date: "2026-11-01", unitPrice: null }] }],
        "2026-12-01",
        frame,
      ),
    ).toBeNull();
    expect(priceHistoryChart([], "2026-12-01", frame)).toBeNull();
  });

  it("spans at least a week, so the last few days of prices are not stretched across the plot", () => {
    const chart = priceHistoryChart(
      [{ points: [{ date: "2026-11-28", unitPrice: 5 }] }],
      "2026-12-01",
      frame,
    )!;
    // Three days of prices on a 7-day axis: 2026-11-28 is day 4 of 7 → 50 + 4/7 × 300 = 221.4.
    expect(chart.start).toBe("2026-11-24");
    expect(chart.series[0]!.path).toBe(`M221.4,${chart.series[0]!.endY} H350`);
  });

  it("labels a year by every other month start", () => {
    const chart = priceHistoryChart(
      [{ points: [{ date: "2025-12-02", unitPrice: 1 }] }],
      "2026-12-02",
      frame,
    )!;
    // 12 month starts from 2026-01-01 to 2026-12-01; every second one keeps at most 7.
    expect(chart.monthTicks).toBe(true);
    expect(chart.dateTicks.map((tick) => tick.date)).toEqual([
      "2026-01-01",
      "2026-03-01",
      "2026-05-01",
      "2026-07-01",
      "2026-09-01",
      "2026-11-01",
    ]);
  });
});

describe("price axis", () => {
  it("puts a single price in the middle of a round axis", () => {
    // 12.5 alone: a step of 0.5 (about a tenth of the price, rounded), one step each side.
    expect(valueAxis(12.5, 12.5)).toEqual({
      bottom: 12,
      top: 13,
      ticks: [12, 12.5, 13],
      decimals: 1,
    });
  });

  it("gives cents of a cent their decimals", () => {
    // 0.02…0.03: a step of 0.005, padded one step each side, 3 decimals to tell ticks apart.
    expect(valueAxis(0.02, 0.03)).toEqual({
      bottom: 0.015,
      top: 0.035,
      ticks: [0.015, 0.02, 0.025, 0.03, 0.035],
      decimals: 3,
    });
  });

  it("never goes below zero for prices that do not", () => {
    // 0.1…5: a step of 2; padding below would reach −2, so the axis starts at 0.
    expect(valueAxis(0.1, 5)).toMatchObject({ bottom: 0, top: 6 });
  });
});

describe("labels beside the plot", () => {
  it("moves labels apart by at least 14 px and keeps them inside the plot", () => {
    // 100 and 104 collide: the lower one moves to 114. The null stays null.
    expect(spreadLabels([100, 104, null, 200], 10, 205)).toEqual([
      100,
      114,
      null,
      200,
    ]);
    // Both near the bottom (205): the lower label is held at 205, the other 14 px above.
    expect(spreadLabels([200, 198], 10, 205)).toEqual([205, 191]);
  });
});

describe("series styles", () => {
  it("gives the first 36 offers different line and marker pairs, the first six differing in both", () => {
    const styles = Array.from({ length: 36 }, (_, index) => seriesStyle(index));
    expect(
      new Set(styles.map((style) => `${style.dash}|${style.marker}`)).size,
    ).toBe(36);
    const firstSix = styles.slice(0, 6);
    expect(new Set(firstSix.map((style) => style.dash)).size).toBe(6);
    expect(new Set(firstSix.map((style) => style.marker)).size).toBe(6);
  });

  it("draws markers centred on the point", () => {
    // A square 8 px across has half-side 0.85 × 4 = 3.4 around (10, 10).
    expect(markerPath("square", 10, 10)).toBe(
      "M6.6,6.6 L13.4,6.6 L13.4,13.4 L6.6,13.4 Z",
    );
    expect(markerPath("cross", 10, 10)).toBe("M6,6 L14,14 M14,6 L6,14");
  });
});
