import { describe, expect, it } from "vitest";
import { MAGNET_GRADES } from "~/engineering/reference-data";
import { compareMagnetGrades, groupMagnetGrades } from "./magnet-materials";

describe("magnet grade order", () => {
  it("puts NdFeB grades by strength, then by temperature suffix in rising order", () => {
    const names = ["N42SH", "N35", "N42", "N38UH", "N42M", "N35AH"].map(
      (name) => ({
        name,
        material: "sintered-ndfeb" as const,
      }),
    );
    expect(names.sort(compareMagnetGrades).map((grade) => grade.name)).toEqual([
      "N35",
      "N35AH",
      "N38UH",
      "N42",
      "N42M",
      "N42SH",
    ]);
  });

  it("keeps grades with other names after the regular ones of their material", () => {
    const grades = [
      { name: "Maker X 45 special", material: "sintered-ndfeb" as const },
      { name: "N52", material: "sintered-ndfeb" as const },
    ];
    expect(grades.sort(compareMagnetGrades).map((grade) => grade.name)).toEqual(
      ["N52", "Maker X 45 special"],
    );
  });

  it("groups every built-in grade once, NdFeB first", () => {
    const groups = groupMagnetGrades(MAGNET_GRADES);
    expect(groups[0]!.label).toBe("Sintered NdFeB");
    expect(groups.flatMap((group) => group.grades)).toHaveLength(
      MAGNET_GRADES.length,
    );
  });
});
