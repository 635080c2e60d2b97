/** POST /api/v1/slot-fills: copper and gross fill against the real server (issue 19, fix 1). */
import { beforeAll, describe, expect, it } from "vitest";
import { sendJson, signInAs } from "../support/app-client";

let cookie = "";
beforeAll(async () => {
  cookie = await signInAs("storekeeper");
});

const post = (body: unknown) =>
  sendJson("POST", "/api/v1/slot-fills", body, cookie);

/** Issue 19's case: IEC 0.20 mm grade 2 (max overall 0.239 mm, IEC 60317-0-1), 668 turns × 2 sides, 60 mm². */
const issueCase = {
  wire: { standard: "IEC", diameterMm: 0.2 },
  insulation: "grade2",
  turns: 668,
  coilSidesPerSlot: 2,
  slotAreaMm2: 60,
};

describe("POST /api/v1/slot-fills", () => {
  it("answers the issue's case: copper 0.700, gross 0.999, cannot fit", async () => {
    const response = await post(issueCase);
    expect(response.status).toBe(200);
    const body = await response.json();
    // GNU units: '1336 * pi/4 * (0.2 mm)^2 / (60 mm^2)' → 0.69952796;
    // '1336 * pi/4 * (0.239 mm)^2 / (60 mm^2)' → 0.99894342; 'pi/sqrt(12)' → 0.90689968.
    expect(body.copperFill).toBeCloseTo(0.69952796, 7);
    expect(body.grossFill).toBeCloseTo(0.99894342, 7);
    expect(body.limit).toBeCloseTo(0.90689968, 7);
    expect(body.fits).toBe(false);
    expect(body.message).toContain("cannot fit");
    expect(body.insulation).toBe("grade2");
    expect(body.insulationAssumed).toBe(false);
  });

  it("answers a healthy fill with the limit it is judged against and no limit passed", async () => {
    const response = await post({
      wire: { standard: "IEC", diameterMm: 1 },
      insulation: "grade2",
      turns: 20,
      coilSidesPerSlot: 2,
      slotAreaMm2: 100,
    });
    const body = await response.json();
    // IEC 1.000 mm grade 2: max overall 1.093 mm (IEC 60317-0-1, from memory).
    // units -t '40*pi/4*(1 mm)^2/(100 mm^2)' → 0.31415927; '40*pi/4*(1.093 mm)^2/(100 mm^2)' → 0.37531
    expect(body.copperFill).toBeCloseTo(0.31415927, 7);
    expect(body.grossFill).toBeCloseTo(0.37531, 5);
    expect(body.limit).toBeCloseTo(0.90689968, 7);
    expect(body.limitPassed).toBeNull();
    expect(body.fits).toBe(true);
  });

  it("takes the liner off and assumes grade 2 for IEC wire without an insulation", async () => {
    const response = await post({
      ...issueCase,
      insulation: undefined,
      linerAreaMm2: 6,
    });
    const body = await response.json();
    // units -t '1336 * pi/4 * (0.239 mm)^2 / (60 mm^2 - 6 mm^2)' → 1.1099371
    expect(body.grossFill).toBeCloseTo(1.1099371, 6);
    expect(body.wireAreaMm2).toBe(54);
    expect(body.insulationAssumed).toBe(true);
  });

  it("refuses nonsense with 400 naming the field", async () => {
    const cases: [Record<string, unknown>, string][] = [
      [{ ...issueCase, turns: 0 }, "turns"],
      [{ ...issueCase, turns: -5 }, "turns"],
      [{ ...issueCase, strands: 0 }, "strands"],
      [{ ...issueCase, slotAreaMm2: 0 }, "slotAreaMm2"],
      [{ ...issueCase, linerAreaMm2: 60 }, "linerAreaMm2"],
      [{ ...issueCase, insulation: "heavy" }, "insulation"],
      [{ ...issueCase, wire: { standard: "AWG", size: "99" } }, "wire.size"],
    ];
    for (const [body, field] of cases) {
      const response = await post(body);
      expect(response.status, JSON.stringify(body)).toBe(400);
      const answer = await response.json();
      expect(Object.keys(answer.error.fields)).toContain(field);
      expect(answer.error.message).toBeTruthy();
    }
  });
});
