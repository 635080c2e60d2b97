import { parseAppUrl, type AppAddress } from "./app-address";

let cached: { setting: string; address: AppAddress } | undefined;

/**
 * The app's public address: APP_URL, read when it changes. Without APP_URL
 * (development only: a production server refuses to start without it) it is
 * this machine on PORT, so localhost, 127.0.0.1 and [::1] are served.
 */
export function appAddress(): AppAddress {
  const setting =
    process.env.APP_URL?.trim() ||
    `http://localhost:${process.env.PORT || "3000"}`;
  if (cached?.setting !== setting)
    cached = { setting, address: parseAppUrl(setting) };
  return cached.address;
}

/**
 * The address every e-mailed link starts with: always APP_URL's, never the
 * request's Host or X-Forwarded-Host, so a link cannot be pointed elsewhere.
 */
export function appUrl(): string {
  return appAddress().origin;
}
