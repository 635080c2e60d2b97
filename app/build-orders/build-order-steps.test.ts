import { describe, expect, it } from "vitest";
import { buildOrderIntents } from "./build-order-forms";
import {
  buildOrderApiStepOf,
  buildOrderApiSteps,
  buildOrderStepCapabilities,
} from "./build-order-steps";
import { capabilityRoles } from "~/lib/capabilities";

describe("build-order step capabilities", () => {
  it("name a capability for every step of the order page", () => {
    expect(Object.keys(buildOrderStepCapabilities).sort()).toEqual(
      [...buildOrderIntents].sort(),
    );
  });

  it("leave issuing to the storekeeper and everything else to the builder", () => {
    expect(capabilityRoles[buildOrderStepCapabilities.issue]).toEqual([
      "storekeeper",
    ]);
    for (const step of [
      "reserve",
      "cancel",
      "complete",
      "quantity",
      "plannedStart",
    ] as const)
      expect(capabilityRoles[buildOrderStepCapabilities[step]]).toEqual([
        "builder",
      ]);
  });
});

describe("buildOrderApiStepOf", () => {
  it("reads the four steps the API takes by path", () => {
    for (const step of buildOrderApiSteps)
      expect(buildOrderApiStepOf(step)).toBe(step);
  });

  it("refuses the number of motors (a PATCH), unknown words and inherited names", () => {
    for (const value of [
      "quantity",
      "melt",
      "",
      "toString",
      "Reserve",
      undefined,
    ])
      expect(buildOrderApiStepOf(value)).toBeNull();
  });
});
