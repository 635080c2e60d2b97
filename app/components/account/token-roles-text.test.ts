import { describe, expect, it } from "vitest";
import { roleLabels } from "~/lib/roles";
import { tokenRolesText } from "./token-roles-text";

describe("the roles of an API token, as its row shows them", () => {
  it("says a token that follows its owner acts with all of the owner's roles", () => {
    expect(tokenRolesText({ followsOwner: true, roles: ["buyer"] })).toBe(
      "all of yours",
    );
  });

  it("lists a chosen set of roles by their labels", () => {
    expect(
      tokenRolesText({ followsOwner: false, roles: ["buyer", "builder"] }),
    ).toBe(`${roleLabels.buyer}, ${roleLabels.builder}`);
    expect(tokenRolesText({ followsOwner: false, roles: [] })).toBe("");
  });
});
