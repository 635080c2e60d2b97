/**
 * What `npm start` and `npm run dev` print once the app answers: where it is,
 * who can sign in, where the mail goes and how to stop. Pure: no I/O.
 */

/** The address the local command serves on: HOST when set, else this machine only. */
export function localListenHost(env: NodeJS.ProcessEnv): string {
  return env.HOST?.trim() || "127.0.0.1";
}

const loopbackHosts = new Set(["127.0.0.1", "localhost", "::1", "[::1]"]);

export type SignInNote =
  | { kind: "demo"; emails: string[]; password: string }
  | { kind: "first-admin"; hint: string }
  | { kind: "accounts" };

export type MailNote =
  { kind: "fake"; messagesUrl: string } | { kind: "smtp"; server: string };

/** SMTP_URL's host and port, never its user name or password. */
export function smtpServerName(smtpUrl: string): string {
  try {
    const url = new URL(smtpUrl);
    return url.port ? `${url.hostname}:${url.port}` : url.hostname;
  } catch {
    return "the server in SMTP_URL";
  }
}

export function startSummary(input: {
  appUrl: string;
  host: string;
  signIn: SignInNote;
  mail: MailNote;
  privateDatabase: boolean;
}): string[] {
  const reach = loopbackHosts.has(input.host)
    ? "this machine only; HOST and APP_URL in the README open it to your network"
    : `listening on ${input.host}`;
  const signIn =
    input.signIn.kind === "demo"
      ? [
          `  sign in  ${input.signIn.emails.join(", ")}`,
          `           password ${input.signIn.password} (demo data)`,
        ]
      : input.signIn.kind === "first-admin"
        ? input.signIn.hint.split("\n").map((line) => `  ${line}`)
        : ["  sign in  with your Turnledger account"];
  const mail =
    input.mail.kind === "fake"
      ? `  mail     caught by the mail fake: the admin's Outbox, or ${input.mail.messagesUrl}`
      : `  mail     sent through ${input.mail.server} (SMTP_URL)`;
  const stop = input.privateDatabase
    ? "  stop     Ctrl+C (MariaDB keeps running: npm run db:stop stops it)"
    : "  stop     Ctrl+C";
  return [
    `[turnledger] ready at ${input.appUrl} (${reach})`,
    ...signIn,
    mail,
    stop,
  ];
}
