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

  it("takes the HcJ coefficient and Curie temperature as optional fields (issue 19, fix 2)", () => {
    const without = magnetGradeFormSchema.parse(dataSheet);
    expect(without.hcjTemperatureCoefficientPercentPerK).toBeUndefined();
    expect(without.curieTemperatureC).toBeUndefined();
    const withThem = magnetGradeFormSchema.parse({
      ...dataSheet,
      hcjTemperatureCoefficientPercentPerK: -0.55,
      curieTemperatureC: 330,
    });
    expect(withThem).toMatchObject({
      hcjTemperatureCoefficientPercentPerK: -0.55,
      curieTemperatureC: 330,
    });
  });

  it("refuses a Curie point at or below the working temperature and an HcJ coefficient of the wrong sign", () => {
    expect(
      messages({ curieTemperatureC: 150 }).curieTemperatureC?.[0],
    ).toContain("above the maximum working temperature (150 °C)");
    expect(messages({ curieTemperatureC: 3100 }).curieTemperatureC).toEqual([
      "The Curie temperature must be between 100 and 1000 °C.",
    ]);
    expect(
      messages({ curieTemperatureC: 330.5 }).curieTemperatureC,
    ).toBeDefined();
    // NdFeB's HcJ falls as it warms (makers' tables −0.5…−0.6 %/K).
    expect(
      messages({ hcjTemperatureCoefficientPercentPerK: 0.5 })
        .hcjTemperatureCoefficientPercentPerK?.[0],
    ).toContain("negative");
    // Ferrite's rises (+0.27 %/K, hsmagnets.com).
    expect(
      messages({
        material: "hard-ferrite",
        temperatureSuffix: undefined,
        hcjTemperatureCoefficientPercentPerK: -0.27,
      }).hcjTemperatureCoefficientPercentPerK?.[0],
    ).toContain("positive");
    expect(
      messages({ hcjTemperatureCoefficientPercentPerK: -5 })
        .hcjTemperatureCoefficientPercentPerK,
    ).toEqual([
      "The HcJ temperature coefficient must be between −1 and 1 %/K.",
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
