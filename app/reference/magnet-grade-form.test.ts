import { describe, expect, it } from "vitest";
import { MAGNET_GRADES } from "~/engineering/reference-data";
import {
  idealMaxEnergyProductKJm3,
  magnetGradeFormSchema,
  magnetGradeKey,
} from "./magnet-grade-form";

const dataSheet = {
  name: "N45TEST",
  material: "sintered-ndfeb",
  temperatureSuffix: "SH",
  brMinT: 1.32,
  brMaxT: 1.37,
  hcbMinKAm: 980,
  hcjMinKAm: 1600,
  bhMaxMinKJm3: 340,
  bhMaxMaxKJm3: 366,
  maxWorkingTemperatureC: 150,
  brTemperatureCoefficientPercentPerK: -0.11,
  densityGPerCm3: 7.55,
  recoilPermeability: 1.05,
  aliases: " n45 test , ",
  source: "an invented data sheet",
};

function messages(change: Record<string, unknown>): Record<string, string[]> {
  const result = magnetGradeFormSchema.safeParse({ ...dataSheet, ...change });
  if (result.success) return {};
  const fields: Record<string, string[]> = {};
  for (const issue of result.error.issues)
    (fields[issue.path.join(".")] ??= []).push(issue.message);
  return fields;
}

describe("the add-grade form", () => {
  it("accepts a plausible data sheet and tidies the other names", () => {
    const result = magnetGradeFormSchema.parse(dataSheet);
    expect(result.aliases).toEqual(["n45 test"]);
    expect(result.coercivityFallsWhenCold).toBe(false);
  });

  it("refuses slipped units and impossible pairs, naming the field", () => {
    expect(messages({ brMaxT: 13.7 }).brMaxT).toEqual([
      "The highest Br must be between 0.1 and 1.6 T.",
    ]);
    expect(messages({ brMaxT: 1.2 }).brMaxT).toEqual([
      "The highest Br cannot be below the lowest.",
    ]);
    expect(messages({ hcjMinKAm: 500 }).hcjMinKAm).toBeDefined();
    expect(
      messages({ material: "hard-ferrite" }).temperatureSuffix,
    ).toBeDefined();
    expect(
      messages({ brTemperatureCoefficientPercentPerK: 0.12 })
        .brTemperatureCoefficientPercentPerK,
    ).toEqual([
      "The Br temperature coefficient must be between −0.5 and 0 %/K.",
    ]);
  });

  it("holds (BH)max under Br²/(4μ0), which every built-in grade respects", () => {
    // Textbook magnetostatics: an ideal magnet with μrec = 1 and Br = 1.37 T reaches 373.4 kJ/m³.
    expect(idealMaxEnergyProductKJm3(1.37)).toBeCloseTo(373.4, 1);
    expect(messages({ bhMaxMaxKJm3: 450 }).bhMaxMaxKJm3?.[0]).toContain(
      "373 kJ/m³",
    );
    for (const grade of MAGNET_GRADES) {
      expect(grade.bhMaxMaxKJm3, grade.name).toBeLessThanOrEqual(
        idealMaxEnergyProductKJm3(grade.brMaxT),
      );
    }
  });

  it("keys a grade by its name in lower case", () => {
    expect(magnetGradeKey(" N45 UH ")).toBe("n45-uh");
  });
});
