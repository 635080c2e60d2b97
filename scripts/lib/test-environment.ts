/**
 * The environment the integration and browser tests run against: the private
 * MariaDB with a fresh test database, the mail fake on test ports, and the
 * production build served on TEST_PORT (built again only when its inputs
 * changed). Used by vitest's global setup.
 */
import { spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import {
  buildInputsHash,
  buildStamp,
  buildStampFile,
  builtServerFile,
  decideBuild,
} from "./build-inputs";
import { migrateDatabase, seedWhenEmpty } from "./database-tasks";
import {
  ensureLocalMariadb,
  recreateDatabase,
  testDatabaseName,
} from "./local-mariadb";
import { startMailFake, type MailFake } from "./mail-fake";
import { appServerArguments } from "./app-server-process";
import { projectRoot } from "./project-paths";
import { runCommand } from "./run-command";

export interface TestEnvironment {
  baseUrl: string;
  mailFakeUrl: string;
  databaseUrl: string;
  smtpUrl: string;
  /** The app server's process id (the benchmarks read its memory). */
  serverPid: number;
  stop(): Promise<void>;
}

async function waitForHealth(
  baseUrl: string,
  server: ChildProcess,
): Promise<void> {
  const started = Date.now();
  while (Date.now() - started < 60_000) {
    if (server.exitCode !== null || server.signalCode !== null)
      throw new Error(
        `the test server exited with ${server.exitCode ?? server.signalCode}`,
      );
    try {
      const response = await fetch(`${baseUrl}/healthz`);
      if (response.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  throw new Error(
    `the test server did not answer at ${baseUrl}/healthz within 60 s`,
  );
}

/** An app server started by `startAppServer`. */
export interface AppServer {
  baseUrl: string;
  pid: number;
  /** True while the process has not exited. */
  running(): boolean;
  stop(): Promise<void>;
}

/** Serves the built app (build/) on a port, as `npm start` does; waits until it answers. */
export async function startAppServer(options: {
  port: number;
  databaseUrl: string;
  smtpUrl: string;
}): Promise<AppServer> {
  const baseUrl = `http://localhost:${options.port}`;
  const server = spawn(process.execPath, appServerArguments(), {
    cwd: projectRoot,
    stdio: ["ignore", "ignore", "inherit"],
    env: {
      ...process.env,
      NODE_ENV: "production",
      PORT: String(options.port),
      HOST: "127.0.0.1",
      DATABASE_URL: options.databaseUrl,
      SMTP_URL: options.smtpUrl,
      APP_URL: baseUrl,
      // The test database holds the demo company, published password and all.
      DEMO_DATA: "1",
    },
  });
  const running = () => server.exitCode === null && server.signalCode === null;
  const exited = new Promise<void>((resolve) =>
    server.once("exit", () => resolve()),
  );
  const stop = async () => {
    if (!running()) return;
    server.kill("SIGTERM");
    await exited;
  };
  try {
    await waitForHealth(baseUrl, server);
  } catch (error) {
    await stop();
    throw error;
  }
  return { baseUrl, pid: server.pid ?? 0, running, stop };
}

/**
 * Builds the app for production unless the build there is was made from the
 * same inputs (scripts/lib/build-inputs.ts) or TEST_SKIP_BUILD=1 says to
 * serve it as it is.
 */
async function buildWhenChanged(): Promise<void> {
  const buildDirectory = path.resolve(
    projectRoot,
    process.env.BUILD_DIRECTORY ?? "build",
  );
  const stampFile = buildStampFile(buildDirectory);
  const inputsHash = buildInputsHash(projectRoot, process.env);
  const buildExists = fs.existsSync(builtServerFile(buildDirectory));
  const decision = decideBuild({
    skipBuild: process.env.TEST_SKIP_BUILD === "1",
    buildExists,
    storedStamp: fs.existsSync(stampFile)
      ? fs.readFileSync(stampFile, "utf8").trim()
      : null,
    currentStamp: buildExists ? buildStamp(inputsHash, buildDirectory) : null,
  });
  if (!decision.build) return;
  fs.rmSync(stampFile, { force: true });
  await runCommand(
    path.join(projectRoot, "node_modules", ".bin", "react-router"),
    ["build"],
    {
      cwd: projectRoot,
      stdio: ["ignore", "ignore", "inherit"],
      // Vitest sets NODE_ENV=test; the app under test is the production build.
      env: { ...process.env, NODE_ENV: "production" },
    },
  );
  fs.writeFileSync(stampFile, `${buildStamp(inputsHash, buildDirectory)}\n`);
}

export async function startTestEnvironment(): Promise<TestEnvironment> {
  let databaseUrl = process.env.TEST_DATABASE_URL;
  if (!databaseUrl) {
    databaseUrl = (await ensureLocalMariadb()).testUrl;
    await recreateDatabase(testDatabaseName());
  }
  await migrateDatabase(databaseUrl);

  const mailFake: MailFake = await startMailFake({
    smtpPort: Number(process.env.TEST_MAIL_SMTP_PORT ?? 2535),
    httpPort: Number(process.env.TEST_MAIL_HTTP_PORT ?? 2536),
    quiet: true,
  });
  // The demo seed's low-stock alerts are e-mailed to this run's own fake, as
  // `npm start` sends them to its own: never to another run's or a developer's.
  process.env.SMTP_URL = `smtp://127.0.0.1:${mailFake.smtpPort}`;
  await seedWhenEmpty(databaseUrl, { quiet: true });

  await buildWhenChanged();
  const port = Number(process.env.TEST_PORT ?? 3100);
  const app = await startAppServer({
    port,
    databaseUrl,
    smtpUrl: `smtp://127.0.0.1:${mailFake.smtpPort}`,
  });
  const baseUrl = app.baseUrl;

  return {
    baseUrl,
    mailFakeUrl: `http://127.0.0.1:${mailFake.httpPort}`,
    databaseUrl,
    smtpUrl: `smtp://127.0.0.1:${mailFake.smtpPort}`,
    serverPid: app.pid,
    async stop() {
      await app.stop();
      await mailFake.close();
    },
  };
}
