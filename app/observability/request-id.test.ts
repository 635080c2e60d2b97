import { describe, expect, it } from "vitest";
import { acceptedRequestId, newRequestId } from "./request-id";

describe("acceptedRequestId", () => {
  it("keeps a proxy's id of letters, digits and dashes", () => {
    const uuid = "3b241101-e2bb-4255-8caf-4136c566a962";
    expect(acceptedRequestId(uuid, true)).toBe(uuid);
    expect(acceptedRequestId("a".repeat(64), true)).toBe("a".repeat(64));
  });

  it("refuses anything else, and everything when no proxy is trusted", () => {
    expect(acceptedRequestId("3b241101-e2bb", false)).toBeNull();
    expect(acceptedRequestId(undefined, true)).toBeNull();
    expect(acceptedRequestId("", true)).toBeNull();
    expect(acceptedRequestId("a".repeat(65), true)).toBeNull();
    for (const odd of [
      "abc def",
      "abc\ndef",
      'abc"}',
      "abc_def",
      "abc.def",
      "é",
      "abc\u0000",
    ])
      expect(acceptedRequestId(odd, true), JSON.stringify(odd)).toBeNull();
  });
});

describe("newRequestId", () => {
  it("is 16 hex digits and differs each time", () => {
    const ids = new Set(Array.from({ length: 1_000 }, newRequestId));
    expect(ids.size).toBe(1_000);
    for (const id of ids) expect(id).toMatch(/^[0-9a-f]{16}$/);
  });
});
