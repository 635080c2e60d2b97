import { describe, expect, it } from "vitest";
import { readOperatingSettings } from "./operating-settings";

describe("readOperatingSettings", () => {
  it("takes 30 minutes and 20 s when nothing is set", () => {
    expect(readOperatingSettings({})).toEqual({
      settings: { outboxMaxAgeMinutes: 30, shutdownGraceMs: 20_000 },
      problems: [],
    });
  });

  it("reads whole numbers, with 0 minutes turning the outbox check off", () => {
    expect(
      readOperatingSettings({
        READY_OUTBOX_MAX_AGE_MINUTES: "0",
        SHUTDOWN_GRACE_MS: " 5000 ",
      }).settings,
    ).toEqual({ outboxMaxAgeMinutes: null, shutdownGraceMs: 5_000 });
    expect(
      readOperatingSettings({ READY_OUTBOX_MAX_AGE_MINUTES: "120" }).settings
        .outboxMaxAgeMinutes,
    ).toBe(120);
  });

  it.each(["abc", "-5", "1.5", "1e3", "30m", "99999999"])(
    "refuses %s, naming the variable and what it takes",
    (setting) => {
      const { problems } = readOperatingSettings({
        READY_OUTBOX_MAX_AGE_MINUTES: setting,
        SHUTDOWN_GRACE_MS: setting,
      });
      expect(problems).toHaveLength(2);
      expect(problems[0]).toContain("READY_OUTBOX_MAX_AGE_MINUTES");
      expect(problems[0]).toContain(`"${setting}"`);
      expect(problems[1]).toContain("SHUTDOWN_GRACE_MS");
    },
  );
});
