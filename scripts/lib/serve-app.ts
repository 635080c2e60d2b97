import { spawn } from "node:child_process";
import path from "node:path";
import {
  migrateDatabase,
  nobodyCanSignIn,
  seedWhenEmpty,
} from "./database-tasks";
import { resolveDatabaseUrl } from "./database-url";
import {
  demoDataWanted,
  firstAdminHint,
  usesPrivateDatabase,
} from "./demo-data";
import { startMailFake, type MailFake } from "./mail-fake";
import { appServerArguments } from "./app-server-process";
import { projectRoot } from "./project-paths";
import { runCommandQuietly } from "./run-command";
import {
  localListenHost,
  smtpServerName,
  startSummary,
  type MailNote,
  type SignInNote,
} from "./start-summary";
import { demoPassword, demoPeople } from "../../seed/demo-people";

/**
 * What `npm start` and `npm run dev` share: the database (started, migrated,
 * seeded with the demo when it is the private one or when asked), the mail
 * fake unless SMTP_URL is set, then the server on APP_URL (by default this
 * machine's http://localhost:PORT, served on 127.0.0.1 unless HOST says
 * otherwise). It prints a few lines; the build's output only when it fails,
 * and the seed's e-mails not at all (the mail fake and the Outbox keep them).
 */
export async function serveApp(
  mode: "production" | "development",
): Promise<void> {
  const privateDatabase = usesPrivateDatabase(process.env);
  const demo = demoDataWanted({
    privateDatabase,
    argv: process.argv.slice(2),
    env: process.env,
  });
  const port = process.env.PORT ?? "3000";
  const host = localListenHost(process.env);
  const appUrl = process.env.APP_URL || `http://localhost:${port}`;
  const databaseUrl = await resolveDatabaseUrl();
  await migrateDatabase(databaseUrl);

  // The mail fake first: the demo seed's low-stock alerts are e-mailed through it.
  let mailFake: MailFake | null = null;
  let smtpUrl = process.env.SMTP_URL;
  let mail: MailNote;
  if (!smtpUrl) {
    const smtpPort = Number(process.env.MAIL_FAKE_SMTP_PORT ?? 2525);
    const httpPort = Number(process.env.MAIL_FAKE_HTTP_PORT ?? 2526);
    try {
      mailFake = await startMailFake({ smtpPort, httpPort, quiet: true });
    } catch (error) {
      throw new Error(
        `The mail fake could not listen on 127.0.0.1:${smtpPort}/${httpPort} (${String(error)}). ` +
          "Stop whatever uses those ports, or set MAIL_FAKE_SMTP_PORT and MAIL_FAKE_HTTP_PORT, or SMTP_URL.",
      );
    }
    smtpUrl = `smtp://127.0.0.1:${mailFake.smtpPort}`;
    mail = {
      kind: "fake",
      messagesUrl: `http://127.0.0.1:${mailFake.httpPort}/messages`,
    };
  } else {
    mail = { kind: "smtp", server: smtpServerName(smtpUrl) };
  }
  process.env.SMTP_URL ??= smtpUrl;
  if (demo) await seedWhenEmpty(databaseUrl, { quiet: true });
  const signIn: SignInNote = demo
    ? {
        kind: "demo",
        emails: demoPeople.map((person) => person.email),
        password: demoPassword(),
      }
    : (await nobodyCanSignIn(databaseUrl))
      ? { kind: "first-admin", hint: firstAdminHint }
      : { kind: "accounts" };

  const bin = (name: string) =>
    path.join(projectRoot, "node_modules", ".bin", name);
  if (mode === "production") {
    console.log("[turnledger] building the app…");
    await runCommandQuietly(bin("react-router"), ["build"], {
      cwd: projectRoot,
    });
  }

  const server = spawn(process.execPath, appServerArguments(), {
    cwd: projectRoot,
    stdio: "inherit",
    env: {
      ...process.env,
      NODE_ENV: mode,
      DATABASE_URL: databaseUrl,
      SMTP_URL: smtpUrl,
      PORT: port,
      HOST: host,
      // On a laptop the app is this machine (localhost, 127.0.0.1, [::1]).
      APP_URL: appUrl,
      // `npm start` is someone using the app in a browser: the terminal keeps
      // the few lines above, not a JSON line per request (warnings and errors
      // still show). `npm run dev` shows every request, pretty-printed.
      // LOG_LEVEL=info brings the request lines back (docs/decisions/024).
      LOG_LEVEL:
        process.env.LOG_LEVEL ?? (mode === "production" ? "warn" : "info"),
      // The demo's published password is allowed on a demo server only
      // (server/deployment-checks.ts).
      ...(demo ? { DEMO_DATA: "1" } : {}),
    },
  });
  const exited = new Promise<number>((resolve) =>
    server.on("exit", (exitCode) => resolve(exitCode ?? 0)),
  );

  const stop = () => {
    server.kill("SIGTERM");
  };
  process.on("SIGINT", stop);
  process.on("SIGTERM", stop);

  if (await answersHealth(port, host, exited)) {
    for (const line of startSummary({
      appUrl,
      host,
      signIn,
      mail,
      privateDatabase: !process.env.DATABASE_URL,
    }))
      console.log(line);
  }
  const code = await exited;
  await mailFake?.close();
  console.log(
    process.env.DATABASE_URL
      ? "[turnledger] stopped."
      : "[turnledger] stopped. MariaDB keeps running: `npm run db:stop` stops it.",
  );
  process.exit(code);
}

/** Waits until the server answers /healthz (true), or has exited (false). */
async function answersHealth(
  port: string,
  host: string,
  exited: Promise<number>,
): Promise<boolean> {
  let gone = false;
  void exited.then(() => (gone = true));
  // Asked where it listens; every address when the host is 0.0.0.0 or ::.
  const asked = ["0.0.0.0", "::", ""].includes(host)
    ? "127.0.0.1"
    : host.includes(":") && !host.startsWith("[")
      ? `[${host}]`
      : host;
  while (!gone) {
    try {
      const health = await fetch(`http://${asked}:${port}/healthz`);
      if (health.status > 0) return true;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  return false;
}
