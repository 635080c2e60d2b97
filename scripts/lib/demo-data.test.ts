import { describe, expect, it } from "vitest";
import { demoDataWanted, usesPrivateDatabase } from "./demo-data";

describe("demo data", () => {
  it("goes into the private MariaDB", () => {
    expect(demoDataWanted({ privateDatabase: true, argv: [], env: {} })).toBe(
      true,
    );
  });

  it("goes into a database given by DATABASE_URL only when asked", () => {
    const env = { DATABASE_URL: "mysql://shop@db.example/turnledger" };
    expect(usesPrivateDatabase(env)).toBe(false);
    expect(demoDataWanted({ privateDatabase: false, argv: [], env })).toBe(
      false,
    );
    expect(
      demoDataWanted({ privateDatabase: false, argv: ["--demo"], env }),
    ).toBe(true);
    expect(
      demoDataWanted({
        privateDatabase: false,
        argv: [],
        env: { ...env, DEMO_DATA: "1" },
      }),
    ).toBe(true);
    expect(
      demoDataWanted({
        privateDatabase: false,
        argv: [],
        env: { ...env, DEMO_DATA: "0" },
      }),
    ).toBe(false);
  });
});
