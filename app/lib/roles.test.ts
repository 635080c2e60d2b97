import { describe, expect, it } from "vitest";
import { isRole, userHasRole } from "./roles";

describe("userHasRole", () => {
  it("passes a person holding one of the roles", () => {
    expect(
      userHasRole({ roles: ["buyer", "manager"] }, ["storekeeper", "manager"]),
    ).toBe(true);
  });
  it("refuses a person holding none of them", () => {
    expect(userHasRole({ roles: ["buyer"] }, ["storekeeper"])).toBe(false);
  });
  it("always passes admins (the brief's table: admin can do anything)", () => {
    expect(userHasRole({ roles: ["admin"] }, ["storekeeper"])).toBe(true);
  });
  it("refuses nobody signed in", () => {
    expect(userHasRole(null, ["buyer"])).toBe(false);
  });
});

describe("isRole", () => {
  it("knows the five roles and nothing else", () => {
    expect(
      ["admin", "buyer", "builder", "storekeeper", "manager"].every(isRole),
    ).toBe(true);
    expect(isRole("owner")).toBe(false);
  });
});
