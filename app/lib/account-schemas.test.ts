import { describe, expect, it } from "vitest";
import {
  changePasswordSchema,
  newPasswordSchema,
  safeRedirectPath,
  signInPausedMessage,
  signInSchema,
} from "./account-schemas";

describe("safeRedirectPath", () => {
  it("keeps same-site paths", () => {
    expect(safeRedirectPath("/admin/people?page=2")).toBe(
      "/admin/people?page=2",
    );
  });
  it("keeps the query and fragment, normalised as a browser reads them", () => {
    expect(safeRedirectPath("/stock/../prices?q=a b#top")).toBe(
      "/prices?q=a%20b#top",
    );
  });
  it.each([
    "//evil.test",
    "/\\evil.test",
    "\\\\evil.test",
    "https://evil.test/",
    "javascript:alert(1)",
    // Browsers drop tabs and newlines anywhere in an address, and controls
    // and spaces at either end: each of these is "//evil.example" to them.
    "/\t/evil.example",
    "/\n/evil.example",
    "/\r\n/evil.example",
    "\u0001//evil.example",
    " //evil.example",
    // Dot segments that collapse into a leading "//".
    "/.//evil.example",
    "/a/..//evil.example",
    "",
    null,
  ])("sends %j home instead", (value) => {
    expect(safeRedirectPath(value)).toBe("/");
  });
  it("keeps a control character inside a path harmless (percent-encoded, same site)", () => {
    expect(safeRedirectPath("/stock\u0000x")).toBe("/stock%00x");
  });
});

describe("signInSchema", () => {
  it("trims the e-mail and accepts a password", () => {
    const parsed = signInSchema.parse({
      email: "  buyer@turnledger.test ",
      password: "x",
    });
    expect(parsed.email).toBe("buyer@turnledger.test");
  });
  it("names the field that is wrong", () => {
    const parsed = signInSchema.safeParse({
      email: "not-an-address",
      password: "x",
    });
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues[0]?.path).toEqual(["email"]);
  });
});

describe("newPasswordSchema", () => {
  it("needs at least 10 characters", () => {
    const parsed = newPasswordSchema.safeParse({
      token: "t",
      password: "short",
      confirmPassword: "short",
    });
    expect(parsed.error?.issues.map((issue) => issue.message)).toEqual([
      "Use at least 10 characters.",
    ]);
  });
  it("needs the two passwords to match", () => {
    const parsed = newPasswordSchema.safeParse({
      token: "t",
      password: "long-enough-1",
      confirmPassword: "long-enough-2",
    });
    expect(parsed.error?.issues[0]?.path).toEqual(["confirmPassword"]);
  });
});

describe("changePasswordSchema", () => {
  it("needs the current password and a new one by the set-password rules", () => {
    const parsed = changePasswordSchema.safeParse({
      currentPassword: "",
      password: "short",
      confirmPassword: "other",
    });
    expect(
      parsed.error?.issues.map((issue) => [issue.path[0], issue.message]),
    ).toEqual([
      ["currentPassword", "Enter your current password."],
      ["password", "Use at least 10 characters."],
      ["confirmPassword", "The two passwords differ."],
    ]);
    const differ = changePasswordSchema.safeParse({
      currentPassword: "the-old-one",
      password: "long-enough-1",
      confirmPassword: "long-enough-2",
    });
    expect(differ.error?.issues[0]?.path).toEqual(["confirmPassword"]);
  });
  it("refuses the password one has now as the new one", () => {
    const parsed = changePasswordSchema.safeParse({
      currentPassword: "long-enough-1",
      password: "long-enough-1",
      confirmPassword: "long-enough-1",
    });
    expect(parsed.error?.issues[0]?.path).toEqual(["password"]);
    expect(
      changePasswordSchema.safeParse({
        currentPassword: "the-old-one",
        password: "long-enough-1",
        confirmPassword: "long-enough-1",
      }).success,
    ).toBe(true);
  });
});

describe("signInPausedMessage", () => {
  it("says what is paused, for how many whole minutes, and how a person lifts a pause on their account", () => {
    expect(signInPausedMessage("account", 61)).toBe(
      "Too many wrong passwords for this account: sign-in to it is paused for 2 minutes. If they were not yours, choose a new password through “Forgotten your password?”; that ends the pause at once.",
    );
    expect(signInPausedMessage("address", 5)).toBe(
      "Too many failed sign-ins from your network address: sign-in from it is paused for 1 minute.",
    );
  });
});
