import { describe, expect, it } from "vitest";
import { buildOrderIntents } from "./build-order-forms";
import {
  buildOrderApiStepOf,
  buildOrderApiSteps,
  buildOrderStepRoles,
} from "./build-order-steps";

describe("build-order step roles", () => {
  it("name a role for every step of the order page", () => {
    expect(Object.keys(buildOrderStepRoles).sort()).toEqual(
      [...buildOrderIntents].sort(),
    );
  });

  it("leave issuing to the storekeeper and everything else to the builder", () => {
    expect(buildOrderStepRoles.issue).toEqual(["storekeeper"]);
    for (const step of ["reserve", "cancel", "complete", "quantity"] as const)
      expect(buildOrderStepRoles[step]).toEqual(["builder"]);
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
