import { describe, expect, it } from "vitest";
import { lineCosts, orderCosts } from "./build-order-costs";

describe("planned versus actual", () => {
  it("prices the plan at the planned cost and each issue at its own (worked by hand)", () => {
    // Planned 10 kg at 12.5000/kg = 125.0000; issued 4 kg at 12.0000 + 6.5 kg at 13.0000 = 48 + 84.5 = 132.5000.
    const wire = {
      required: 10_000n,
      issued: 10_500n,
      plannedUnitCost: 125_000n,
      issues: [
        { quantity: 4_000n, unitCost: 120_000n },
        { quantity: 6_500n, unitCost: 130_000n },
      ],
    };
    expect(lineCosts(wire)).toEqual({
      difference: 500n,
      plannedCost: 1_250_000n,
      actualCost: 1_325_000n,
    });
    // 40 magnets planned at 0.8500, 38 issued at 0.8500: 34.0000 planned, 32.3000 actual.
    const magnets = {
      required: 40_000n,
      issued: 38_000n,
      plannedUnitCost: 8_500n,
      issues: [{ quantity: 38_000n, unitCost: 8_500n }],
    };
    const costs = orderCosts([wire, magnets], 4);
    expect(costs.plannedTotal).toBe(1_590_000n); // 159.0000
    expect(costs.actualTotal).toBe(1_648_000n); // 164.8000
    expect(costs.plannedPerMotor).toBe(397_500n); // 39.7500
    expect(costs.actualPerMotor).toBe(412_000n); // 41.2000
    expect(costs.plannedComplete).toBe(true);
  });

  it("rounds per motor half away from zero to 0.0001 (100.0001 ÷ 3 = 33.33336… → 33.3334)", () => {
    const costs = orderCosts(
      [
        {
          required: 1_000n,
          issued: 1_000n,
          plannedUnitCost: null,
          issues: [{ quantity: 1_000n, unitCost: 1_000_001n }],
        },
      ],
      3,
    );
    expect(costs.actualPerMotor).toBe(333_334n);
    expect(costs.plannedComplete).toBe(false);
    expect(costs.lines[0]!.plannedCost).toBeNull();
  });

  it("rounds each issue's value once (0.333 kg at 0.0010/kg = 0.000333 → 0.0003)", () => {
    expect(
      lineCosts({
        required: 333n,
        issued: 333n,
        plannedUnitCost: 10n,
        issues: [{ quantity: 333n, unitCost: 10n }],
      }).actualCost,
    ).toBe(3n);
  });
});
