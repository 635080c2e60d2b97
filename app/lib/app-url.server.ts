/** The app's public address for links in e-mails: APP_URL, or the request's own origin. */
export function appUrl(request: Request): string {
  const configured = process.env.APP_URL?.replace(/\/+$/, "");
  return configured || new URL(request.url).origin;
}
