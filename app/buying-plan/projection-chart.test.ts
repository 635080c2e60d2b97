import { describe, expect, it } from "vitest";
import { projectionChart } from "./projection-chart";

const frame = {
  width: 440,
  height: 240,
  left: 40,
  right: 0,
  top: 20,
  bottom: 20,
};

// The magnets of buying-plan.test.ts's worked example: 40 free; BO-12 takes 130 in the
// second week (100 suggested), BO-21 takes 25 in the fourth (20 suggested).
const weeks = [
  {
    weekStart: "2026-11-30",
    needed: 0,
    arriving: 0,
    suggested: 0,
    projected: 40,
    projectedWithSuggestion: 40,
  },
  {
    weekStart: "2026-12-07",
    needed: 130,
    arriving: 0,
    suggested: 100,
    projected: -90,
    projectedWithSuggestion: 10,
  },
  {
    weekStart: "2026-12-14",
    needed: 0,
    arriving: 0,
    suggested: 0,
    projected: 10,
    projectedWithSuggestion: 10,
  },
  {
    weekStart: "2026-12-21",
    needed: 25,
    arriving: 0,
    suggested: 20,
    projected: -15,
    projectedWithSuggestion: 5,
  },
];

describe("projectionChart", () => {
  const chart = projectionChart(weeks, 0, frame, true)!;

  it("takes the suggestions back out for the line without ordering (by hand: 40, −90, −90, −115)", () => {
    expect(chart.points.map((point) => point.without)).toEqual([
      40, -90, -90, -115,
    ]);
    expect(chart.points.map((point) => point.with)).toEqual([40, 10, 10, 5]);
  });

  it("spans below zero in round steps and puts each week in the middle of its column", () => {
    // −115 … 40 spans 155: roundStep(155) = 50; from −150 to 50.
    expect(chart.valueTicks.map((tick) => tick.value)).toEqual([
      -150, -100, -50, 0, 50,
    ]);
    // 200 px of plot for 200 units: 0 sits 150 px above the bottom (220 − 150 = 70).
    expect(chart.zeroY).toBe(70);
    expect(chart.points.map((point) => point.x)).toEqual([90, 190, 290, 390]);
    expect(chart.reorderY).toBeNull();
  });

  it("draws the reorder point when there is one", () => {
    const withPoint = projectionChart(weeks, 50, frame, true)!;
    expect(withPoint.reorderY).toBe(20);
  });

  it("has nothing to draw without weeks", () => {
    expect(projectionChart([], 5, frame)).toBeNull();
  });
});
