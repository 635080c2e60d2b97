import { describe, expect, it } from "vitest";
import {
  isLoopbackAddress,
  mayReadMetrics,
  sameSecret,
} from "./metrics-access";

describe("isLoopbackAddress", () => {
  it("knows this machine's addresses in every form a socket reports them", () => {
    for (const address of [
      "127.0.0.1",
      "127.8.9.10",
      "::1",
      "::ffff:127.0.0.1",
    ])
      expect(isLoopbackAddress(address), address).toBe(true);
    for (const address of [
      "10.0.0.5",
      "192.168.1.20",
      "::ffff:10.0.0.5",
      "fe80::1",
      "128.0.0.1",
      "",
      undefined,
    ])
      expect(isLoopbackAddress(address), String(address)).toBe(false);
  });
});

describe("mayReadMetrics", () => {
  const token = "a-long-metrics-token-0123456789";
  const from = (
    remoteAddress: string,
    extra: Partial<Parameters<typeof mayReadMetrics>[0]> = {},
  ) => ({
    remoteAddress,
    forwarded: false,
    authorization: undefined,
    behindProxy: false,
    ...extra,
  });

  it("lets a scraper on this machine in, with or without a token configured", () => {
    expect(mayReadMetrics(from("127.0.0.1"), undefined)).toBe(true);
    expect(mayReadMetrics(from("::1"), token)).toBe(true);
  });

  it("refuses a loopback connection a proxy forwarded (someone on the internet behind it)", () => {
    expect(
      mayReadMetrics(from("127.0.0.1", { forwarded: true }), undefined),
    ).toBe(false);
  });

  it("behind a trusted proxy, lets loopback in only with the token (a proxy may add no forwarding header)", () => {
    expect(
      mayReadMetrics(from("127.0.0.1", { behindProxy: true }), undefined),
    ).toBe(false);
    expect(
      mayReadMetrics(
        from("127.0.0.1", {
          behindProxy: true,
          authorization: `Bearer ${token}`,
        }),
        token,
      ),
    ).toBe(true);
  });

  it("lets others in only with the configured bearer token", () => {
    expect(mayReadMetrics(from("10.0.0.5"), undefined)).toBe(false);
    expect(
      mayReadMetrics(
        from("10.0.0.5", { authorization: `Bearer ${token}` }),
        undefined,
      ),
    ).toBe(false);
    expect(mayReadMetrics(from("10.0.0.5"), token)).toBe(false);
    expect(
      mayReadMetrics(
        from("10.0.0.5", { authorization: "Bearer wrong" }),
        token,
      ),
    ).toBe(false);
    expect(
      mayReadMetrics(
        from("10.0.0.5", { authorization: `Bearer ${token}x` }),
        token,
      ),
    ).toBe(false);
    expect(
      mayReadMetrics(from("10.0.0.5", { authorization: token }), token),
    ).toBe(false);
    expect(
      mayReadMetrics(
        from("10.0.0.5", { authorization: `Bearer ${token}` }),
        token,
      ),
    ).toBe(true);
    expect(
      mayReadMetrics(
        from("127.0.0.1", {
          forwarded: true,
          authorization: `bearer ${token}`,
        }),
        token,
      ),
    ).toBe(true);
  });

  it("compares secrets of any length", () => {
    expect(sameSecret("abc", "abc")).toBe(true);
    expect(sameSecret("abc", "abcd")).toBe(false);
    expect(sameSecret("", "abc")).toBe(false);
  });
});
