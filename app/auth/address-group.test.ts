import { describe, expect, it } from "vitest";
import { addressGroup } from "./address-group";

describe("addressGroup", () => {
  it.each([
    ["203.0.113.7", "203.0.113.7"],
    ["::ffff:203.0.113.7", "203.0.113.7"],
    ["::FFFF:127.0.0.1", "127.0.0.1"],
  ])("counts IPv4 %s on its own, as %s", (address, group) => {
    expect(addressGroup(address)).toBe(group);
  });

  it.each([
    ["2001:db8:1:2:3:4:5:6", "2001:db8:1:2::/64"],
    ["2001:0DB8:0001:0002:ffff:ffff:ffff:ffff", "2001:db8:1:2::/64"],
    ["2001:db8:1:2::9", "2001:db8:1:2::/64"],
    ["2001:db8::1", "2001:db8:0:0::/64"],
    ["fe80::1%eth0", "fe80:0:0:0::/64"],
    ["::1", "0:0:0:0::/64"],
    ["64:ff9b::192.0.2.1", "64:ff9b:0:0::/64"],
  ])("counts IPv6 %s by its /64, %s", (address, group) => {
    expect(addressGroup(address)).toBe(group);
  });

  it("puts two addresses of one /64 together and of two /64s apart", () => {
    expect(addressGroup("2001:db8:a:b::1")).toBe(
      addressGroup("2001:db8:a:b:ffff::2"),
    );
    expect(addressGroup("2001:db8:a:b::1")).not.toBe(
      addressGroup("2001:db8:a:c::1"),
    );
  });

  it("keeps anything else as it is, shortened", () => {
    expect(addressGroup("unknown")).toBe("unknown");
    expect(addressGroup("1:2:3")).toBe("1:2:3");
    expect(addressGroup("x".repeat(300))).toHaveLength(64);
  });
});
