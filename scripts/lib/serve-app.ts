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
import { runCommand } from "./run-command";

/**
 * What `npm start` and `npm run dev` share: the database (started, migrated,
 * seeded with the demo when it is the private one or when asked), the mail
 * fake unless SMTP_URL is set, then the server on APP_URL (by default this
 * machine's http://localhost:PORT).
 */
export async function serveApp(
  mode: "production" | "development",
): Promise<void> {
  const demo = demoDataWanted({
    privateDatabase: usesPrivateDatabase(process.env),
    argv: process.argv.slice(2),
    env: process.env,
  });
  const port = process.env.PORT ?? "3000";
  const databaseUrl = await resolveDatabaseUrl();
  await migrateDatabase(databaseUrl);

  // The mail fake first: the demo seed's low-stock alerts are e-mailed through it.
  let mailFake: MailFake | null = null;
  let smtpUrl = process.env.SMTP_URL;
  if (!smtpUrl) {
    const smtpPort = Number(process.env.MAIL_FAKE_SMTP_PORT ?? 2525);
    const httpPort = Number(process.env.MAIL_FAKE_HTTP_PORT ?? 2526);
    try {
      mailFake = await startMailFake({ smtpPort, httpPort });
    } catch (error) {
      throw new Error(
        `The mail fake could not listen on 127.0.0.1:${smtpPort}/${httpPort} (${String(error)}). ` +
          "Stop whatever uses those ports, or set MAIL_FAKE_SMTP_PORT and MAIL_FAKE_HTTP_PORT, or SMTP_URL.",
      );
    }
    smtpUrl = `smtp://127.0.0.1:${mailFake.smtpPort}`;
    console.log(
      `[turnledger] mail fake on ${smtpUrl}; every message shows in the admin's Outbox.`,
    );
  }
  process.env.SMTP_URL ??= smtpUrl;
  if (demo) await seedWhenEmpty(databaseUrl);
  else if (await nobodyCanSignIn(databaseUrl))
    console.log(`[turnledger] ${firstAdminHint}`);

  const bin = (name: string) =>
    path.join(projectRoot, "node_modules", ".bin", name);
  if (mode === "production") {
    console.log("[turnledger] building the app…");
    await runCommand(bin("react-router"), ["build"], { cwd: projectRoot });
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
      // On a laptop the app is this machine (localhost, 127.0.0.1, [::1]).
      APP_URL: process.env.APP_URL || `http://localhost:${port}`,
      // The demo's published password is allowed on a demo server only
      // (server/deployment-checks.ts).
      ...(demo ? { DEMO_DATA: "1" } : {}),
    },
  });

  const stop = () => {
    server.kill("SIGTERM");
  };
  process.on("SIGINT", stop);
  process.on("SIGTERM", stop);
  const code = await new Promise<number>((resolve) =>
    server.on("exit", (exitCode) => resolve(exitCode ?? 0)),
  );
  await mailFake?.close();
  console.log(
    "[turnledger] stopped. MariaDB keeps running: `npm run db:stop` stops it.",
  );
  process.exit(code);
}
