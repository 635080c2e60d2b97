import { describe, expect, it } from "vitest";
import {
  expectedOrigin,
  isLoopbackHostname,
  parseAppUrl,
  servesHost,
} from "./app-address";

describe("APP_URL", () => {
  it("names one host that is served, with or without its default port", () => {
    const address = parseAppUrl("https://Turnledger.Example.com/");
    expect(address.origin).toBe("https://turnledger.example.com");
    expect(address.loopback).toBe(false);
    expect(servesHost(address, "turnledger.example.com")).toBe(true);
    expect(servesHost(address, "TURNLEDGER.example.com:443")).toBe(true);
    expect(servesHost(address, "turnledger.example.com:80")).toBe(false);
    expect(servesHost(address, "evil.example")).toBe(false);
    expect(servesHost(address, "10.0.0.5:3000")).toBe(false);
    expect(servesHost(address, "localhost:3000")).toBe(false);
    expect(servesHost(address, undefined)).toBe(false);
  });

  it("on this machine's loopback serves localhost, 127.0.0.1 and [::1] on its port", () => {
    const address = parseAppUrl("http://localhost:3000");
    expect(address.loopback).toBe(true);
    for (const host of ["localhost:3000", "127.0.0.1:3000", "[::1]:3000"])
      expect(servesHost(address, host)).toBe(true);
    expect(servesHost(address, "localhost:3001")).toBe(false);
    expect(servesHost(address, "localhost")).toBe(false);
    expect(servesHost(address, "evil.example:3000")).toBe(false);
    expect(isLoopbackHostname("[::1]")).toBe(true);
    expect(isLoopbackHostname("127.0.0.2")).toBe(false);
  });

  it("expects forms from its own origin; on loopback by the name the page was opened with", () => {
    const deployed = parseAppUrl("https://turnledger.example.com");
    expect(expectedOrigin(deployed, "turnledger.example.com")).toBe(
      "https://turnledger.example.com",
    );
    expect(expectedOrigin(deployed, "evil.example")).toBeNull();
    const laptop = parseAppUrl("http://localhost:3000");
    expect(expectedOrigin(laptop, "127.0.0.1:3000")).toBe(
      "http://127.0.0.1:3000",
    );
    expect(expectedOrigin(laptop, "[::1]:3000")).toBe("http://[::1]:3000");
  });

  it("is refused with a reason when it is not a bare http(s) address", () => {
    expect(() => parseAppUrl("turnledger.example.com")).toThrow(
      /not an address/,
    );
    expect(() => parseAppUrl("ftp://turnledger.example.com")).toThrow(
      /https:\/\/ or http:\/\//,
    );
    expect(() => parseAppUrl("https://turnledger.example.com/app")).toThrow(
      /without a path/,
    );
    expect(() => parseAppUrl("https://a:b@turnledger.example.com")).toThrow(
      /without user/,
    );
  });
});
