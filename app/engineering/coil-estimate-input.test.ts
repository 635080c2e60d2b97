import { describe, expect, it } from "vitest";
import {
  conductorSplit,
  estimateCoil,
  type CoilEstimateInput,
} from "./coil-estimate";
import { assertCoilEstimateInput } from "./coil-estimate-input";
import { EngineeringInputError } from "./errors";

/** Worked check 4 of the brief: 0.80 mm copper, 40 turns, 50 mm active, 30 mm end turn. */
const COIL: CoilEstimateInput = {
  conductor: "copper",
  wire: { standard: "IEC", diameterMm: 0.8 },
  turns: 40,
  activeLengthMm: 50,
  endTurnLengthMm: 30,
};

function fieldOf(run: () => unknown): string | undefined {
  try {
    run();
  } catch (error) {
    if (error instanceof EngineeringInputError) return error.field;
    throw error;
  }
  return undefined;
}

// Each case gave a negative mass, a negative or infinite resistance or NaN before
// issue 19 (fix 6); now each is refused with the API's input path as the field.
const refusals: [string, Partial<CoilEstimateInput>, string][] = [
  ["turns −5", { turns: -5 }, "turns"],
  ["turns 0", { turns: 0 }, "turns"],
  ["turns 2.5", { turns: 2.5 }, "turns"],
  ["turns NaN", { turns: Number.NaN }, "turns"],
  ["strands 0", { strandsInHand: 0 }, "strandsInHand"],
  ["strands −2", { strandsInHand: -2 }, "strandsInHand"],
  ["active length −50 mm", { activeLengthMm: -50 }, "activeLengthMm"],
  ["active length 0 mm", { activeLengthMm: 0 }, "activeLengthMm"],
  [
    "active length Infinity",
    { activeLengthMm: Number.POSITIVE_INFINITY },
    "activeLengthMm",
  ],
  ["end turn −30 mm", { endTurnLengthMm: -30 }, "endTurnLengthMm"],
  ["lead −1 mm", { leadLengthMm: -1 }, "leadLengthMm"],
  ["coil count −3", { coilCount: -3 }, "coilCount"],
  ["coil count 0", { coilCount: 0 }, "coilCount"],
  ["temperature NaN", { temperatureC: Number.NaN }, "temperatureC"],
  ["temperature −300 °C", { temperatureC: -300 }, "temperatureC"],
  ["temperature 1000 °C", { temperatureC: 1000 }, "temperatureC"],
  ["scrap −5 %", { scrapPercent: -5 }, "scrapPercent"],
  ["scrap 150 %", { scrapPercent: 150 }, "scrapPercent"],
  ["current −10 A", { currentA: -10 }, "currentA"],
  ["current Infinity", { currentA: Number.POSITIVE_INFINITY }, "currentA"],
  [
    "diameter NaN",
    { wire: { standard: "IEC", diameterMm: Number.NaN } },
    "wire.diameterMm",
  ],
  [
    "a wire standard that is neither",
    {
      wire: {
        standard: "SWG",
        size: "20",
      } as unknown as CoilEstimateInput["wire"],
    },
    "wire.standard",
  ],
  [
    "an unknown conductor",
    { conductor: "silver" as CoilEstimateInput["conductor"] },
    "conductor",
  ],
];

describe("coil estimate input (issue 19, fix 6)", () => {
  it.each(refusals)("refuses %s", (_label, change, field) => {
    const input = { ...COIL, ...change };
    expect(fieldOf(() => assertCoilEstimateInput(input))).toBe(field);
    expect(fieldOf(() => estimateCoil(input))).toBe(field);
    expect(fieldOf(() => conductorSplit(input))).toBe(field);
  });

  it("takes the worked check as it is", () => {
    expect(() => assertCoilEstimateInput(COIL)).not.toThrow();
    expect(() =>
      assertCoilEstimateInput({
        ...COIL,
        strandsInHand: 3,
        leadLengthMm: 0,
        coilCount: 12,
        temperatureC: -70,
        scrapPercent: 0,
        currentA: 0,
      }),
    ).not.toThrow();
  });
});
