import { beforeAll, describe, expect, it } from "vitest";
import { get, sendJson, signInAs } from "../support/app-client";

let cookie = "";
beforeAll(async () => {
  cookie = await signInAs("storekeeper");
});

const post = (body: unknown) =>
  sendJson("POST", "/api/v1/winding-factors", body, cookie);

interface Refusal {
  error: { message: string; fields: Record<string, string[]> };
}

describe("POST /api/v1/winding-factors", () => {
  it("12 slots / 10 poles double layer: 0.933, 5th 0.067 (Libert & Soulard, ICEM 2004; from memory)", async () => {
    const response = await post({ slots: 12, poles: 10, layers: 2 });
    expect(response.status).toBe(200);
    const body = (await response.json()) as {
      fundamental: number;
      harmonics: { order: number; factor: number }[];
      coilPitch: number;
    };
    expect(Math.abs(body.fundamental - 0.933)).toBeLessThan(0.0005);
    expect(body.harmonics.map((h) => h.order)).toEqual([
      1, 5, 7, 11, 13, 17, 19,
    ]);
    // sin² 15° = 0.066987 worked by hand (winding-factor.test.ts).
    expect(Math.abs(body.harmonics[1]!.factor - 0.067)).toBeLessThan(0.0005);
    expect(body.coilPitch).toBe(1);
  });

  it("9 slots / 8 poles double layer: 0.945 (Libert & Soulard; from memory)", async () => {
    const body = (await (
      await post({ slots: 9, poles: 8, layers: 2, phases: 3 })
    ).json()) as { fundamental: number };
    expect(Math.abs(body.fundamental - 0.945)).toBeLessThan(0.0005);
  });

  it.each([
    ["slots", { slots: 10, poles: 8, layers: 2 }, /cannot make a balanced/],
    ["poles", { slots: 12, poles: 9, layers: 2 }, /even number of poles/],
    ["layers", { slots: 9, poles: 8, layers: 1 }, /even number of slots/],
    ["layers", { slots: 12, poles: 10, layers: 3 }, /1 layer/],
    ["slots", { slots: "twelve", poles: 10, layers: 2 }, /number/],
    ["poles", { slots: 12, layers: 2 }, /Give the pole count/],
    ["phases", { slots: 12, poles: 10, layers: 2, phases: 4 }, /odd number/],
  ])(
    "refuses a bad %s with 400 in the shared error shape",
    async (field, body, message) => {
      const response = await post(body);
      expect(response.status).toBe(400);
      const refusal = (await response.json()) as Refusal;
      expect(refusal.error.fields[field]![0]).toMatch(message);
    },
  );

  it("needs a signed-in caller and POST", async () => {
    expect(
      (
        await sendJson("POST", "/api/v1/winding-factors", {
          slots: 12,
          poles: 10,
          layers: 2,
        })
      ).status,
    ).toBe(401);
    expect((await get("/api/v1/winding-factors", cookie)).status).toBe(405);
  });
});
