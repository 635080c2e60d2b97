import { describe, expect, it } from "vitest";
import type { Figure } from "./coil-estimates.bench";
import { formatSummary, goalLines, sizeRatioPrefix } from "./summary";

const figure = (
  name: string,
  p95: number,
  extra: Partial<Figure> = {},
): Figure => ({
  name,
  unit: "ms",
  target: "reported",
  passed: true,
  median: p95,
  p95,
  samples: [],
  ...extra,
});

describe("the bench summary's goals", () => {
  it("marks a ratio goal met or missed from the app figure and its raw baseline", () => {
    const lines = goalLines([
      figure("POST /api/v1/stock-movements", 9),
      figure("raw SQL of one movement (transaction)", 2),
      figure("design costing API under load: requests per second (app)", 500),
      figure(
        "design costing API under load: requests per second (raw mysql2)",
        1900,
      ),
    ]);
    const movement = lines.find((line) => line.goal.startsWith("recording"))!;
    expect(movement).toMatchObject({
      value: "4.50×",
      limit: "≤ 3×",
      result: "MISSED",
    });
    // Throughput the other way round: raw ÷ app.
    const costing = lines.find((line) =>
      line.goal.startsWith("design costing"),
    )!;
    expect(costing).toMatchObject({ value: "3.80×", result: "met" });
    const commit = lines.find((line) =>
      line.goal.includes("price-list commit"),
    )!;
    expect(commit.result).toBe("not measured");
  });

  it("holds every Lighthouse page to the limit and names the worst", () => {
    const lines = goalLines([
      figure("Lighthouse mobile performance: /stock", 95),
      figure("Lighthouse mobile performance: /designs/1", 88),
    ]);
    const lighthouse = lines.find((line) =>
      line.goal.startsWith("Lighthouse"),
    )!;
    expect(lighthouse).toMatchObject({ value: "88.00", result: "MISSED" });
    expect(lighthouse.goal).toContain("worst of 2");
  });

  it("shows both sizes side by side with their ratio, within 110 columns", () => {
    const summary = formatSummary({
      at: "2026-12-04T00:00:00.000Z",
      machine: { node: "v20", cpus: 2 },
      figures: [
        figure("item API, GET /api/v1/items/:sku @ 1 M", 4),
        figure("item API, GET /api/v1/items/:sku @ 10 M", 7),
        figure(
          `${sizeRatioPrefix} 10 M ÷ 1 M: item API, GET /api/v1/items/:sku`,
          1.75,
          {
            target: "≤ 1.5×",
            passed: false,
          },
        ),
      ],
    });
    const side = summary.find((line) =>
      line.startsWith("item API, GET /api/v1/items/:sku "),
    )!;
    expect(side).toMatch(/4\.00\s+7\.00\s+1\.75×\s+≤ 1\.5×\s+MISSED$/);
    expect(summary.find((line) => line.includes("÷ at 1 M: item API"))).toMatch(
      /MISSED$/,
    );
    for (const line of summary) expect(line.length).toBeLessThanOrEqual(110);
  });
});
