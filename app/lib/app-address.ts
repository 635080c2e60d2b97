/**
 * The app's public address (APP_URL) and the Host headers it answers to.
 * Pure: read by the server's first middleware, by the Origin check and by
 * every e-mailed link, and tested beside itself.
 *
 * A deployment's APP_URL names one host, and only requests for that host are
 * served: a request that names another (a poisoned Host header, a scan by IP
 * address) never reaches a route. An APP_URL on this machine's loopback
 * (`http://localhost:3000`, what `npm start` and the tests set) stands for the
 * machine itself: localhost, 127.0.0.1 and [::1] on its port are all served.
 */

export interface AppAddress {
  /** `https://turnledger.example.com` — no path, no trailing slash. */
  origin: string;
  protocol: "http:" | "https:";
  /** The port requests arrive on ("" for the scheme's default). */
  port: string;
  /** Lower-case Host header values this app answers to. */
  hosts: ReadonlySet<string>;
  /** True when APP_URL names this machine's loopback. */
  loopback: boolean;
}

const loopbackNames = ["localhost", "127.0.0.1", "[::1]"];

/** Whether a URL host name (as `new URL().hostname` gives it) is this machine's loopback. */
export function isLoopbackHostname(hostname: string): boolean {
  return loopbackNames.includes(hostname.toLowerCase());
}

/** Reads APP_URL; throws an Error whose message says what is wrong with it. */
export function parseAppUrl(value: string): AppAddress {
  let url: URL;
  try {
    url = new URL(value.trim());
  } catch {
    throw new Error(
      `APP_URL "${value}" is not an address. Give the public address people open, e.g. https://turnledger.example.com`,
    );
  }
  if (url.protocol !== "http:" && url.protocol !== "https:")
    throw new Error(
      `APP_URL must start with https:// or http:// (got "${value}").`,
    );
  if (url.username || url.password || url.search || url.hash)
    throw new Error(
      `APP_URL is the bare address, without user, query or fragment (got "${value}").`,
    );
  if (url.pathname !== "/")
    throw new Error(
      `APP_URL must be served at the root of its host, without a path (got "${value}").`,
    );
  const loopback = isLoopbackHostname(url.hostname);
  const names = loopback ? loopbackNames : [url.hostname.toLowerCase()];
  const hosts = new Set<string>();
  for (const name of names) {
    hosts.add(url.port ? `${name}:${url.port}` : name);
    // A client may name the default port (example.com:443) or leave it out.
    if (!url.port) hosts.add(`${name}:${url.protocol === "https:" ? 443 : 80}`);
  }
  return {
    origin: url.origin,
    protocol: url.protocol,
    port: url.port,
    hosts,
    loopback,
  };
}

/** Whether a request's Host header names this app. */
export function servesHost(
  address: AppAddress,
  host: string | undefined,
): boolean {
  return host !== undefined && address.hosts.has(host.trim().toLowerCase());
}

/**
 * The origin a browser that opened the app through `host` sends with its
 * forms: APP_URL's, or on loopback the same machine by the name it was opened
 * with. Null when the host is not one the app serves.
 */
export function expectedOrigin(
  address: AppAddress,
  host: string | undefined,
): string | null {
  if (!servesHost(address, host)) return null;
  if (!address.loopback) return address.origin;
  return new URL(`${address.protocol}//${host!.trim().toLowerCase()}`).origin;
}
