/**
 * The group a client address is counted in by the sign-in and reset limits:
 * an IPv4 address on its own, an IPv6 address by its /64 (one home or office
 * network is given a whole /64, so counting single IPv6 addresses would let
 * one client take billions of fresh ones). IPv4-mapped IPv6 addresses
 * (`::ffff:192.0.2.1`, as Node reports IPv4 clients on a dual-stack socket)
 * count as the IPv4 address.
 */
export function addressGroup(address: string): string {
  const plain = address.trim().toLowerCase().replace(/%.*$/, "");
  const mapped = /^::ffff:(\d{1,3}(?:\.\d{1,3}){3})$/.exec(plain);
  if (mapped) return mapped[1]!;
  if (!plain.includes(":")) return plain.slice(0, 64);
  const groups = ipv6Groups(plain);
  if (!groups) return plain.slice(0, 64);
  return `${groups.slice(0, 4).join(":")}::/64`;
}

/** The eight 16-bit groups of an IPv6 address (without leading zeros), or null when it is not one. */
function ipv6Groups(address: string): string[] | null {
  const halves = address.split("::");
  if (halves.length > 2) return null;
  const part = (text: string | undefined) =>
    text ? text.split(":").flatMap(groupsOf) : [];
  const head = part(halves[0]);
  const tail = part(halves[1]);
  if (head.includes("") || tail.includes("")) return null;
  const missing = 8 - head.length - tail.length;
  if (halves.length === 2 ? missing < 1 : missing !== 0) return null;
  return [...head, ...Array<string>(missing).fill("0"), ...tail];
}

/** One written group as 16-bit groups: "db8" → ["db8"], a trailing "192.0.2.1" → ["c000", "201"]; [""] when invalid. */
function groupsOf(text: string): string[] {
  if (/^[0-9a-f]{1,4}$/.test(text)) return [text.replace(/^0+(?=.)/, "")];
  const octets = /^(\d{1,3})\.(\d{1,3})\.(\d{1,3})\.(\d{1,3})$/.exec(text);
  if (!octets) return [""];
  const [a, b, c, d] = octets.slice(1).map(Number) as [
    number,
    number,
    number,
    number,
  ];
  if ([a, b, c, d].some((octet) => octet > 255)) return [""];
  return [((a << 8) | b).toString(16), ((c << 8) | d).toString(16)];
}
