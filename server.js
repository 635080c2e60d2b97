// The HTTP server: Express in front of React Router, in development (with
// Vite's dev middleware and hot reload) and in production (the built app).
// On SIGTERM or SIGINT it stops gracefully (server/shutdown.ts): no new
// connections, requests in flight finish within SHUTDOWN_GRACE_MS, then the
// database pool closes and the process exits 0. A second signal, a moment
// after the first, exits at once.
import fs from "node:fs";
import http from "node:http";
import express from "express";
import expressStaticGzip from "express-static-gzip";

const developing = process.env.NODE_ENV === "development";
const port = Number.parseInt(process.env.PORT || "3000", 10);
// Every interface by default, as a deployment behind a proxy or in a container
// needs; `npm start` and `npm run dev` pass HOST=127.0.0.1 unless HOST is set
// (scripts/lib/serve-app.ts), so a laptop serves itself only.
const host = process.env.HOST || "0.0.0.0";

const app = express();
app.disable("x-powered-by");

// The app's logger (app/observability/logger.server.ts, docs/decisions/024).
let log;
/** The app's server module (server/app.ts): built, or loaded through Vite in development. */
let appModule;
/** Closes Vite's dev server, in development. */
let closeDevServer = async () => {};

if (developing) {
  const vite = await import("vite");
  const viteDevServer = await vite.createServer({
    server: { middlewareMode: true },
  });
  // Loaded again when stopping, to stop with the module as it is by then.
  appModule = () => viteDevServer.ssrLoadModule("./server/app.ts");
  closeDevServer = () => viteDevServer.close();
  ({ logger: log } = await viteDevServer.ssrLoadModule(
    "./app/observability/logger.server.ts",
  ));
  app.use(viteDevServer.middlewares);
  app.use(async (request, response, next) => {
    try {
      const source = await viteDevServer.ssrLoadModule("./server/app.ts");
      return await source.app(request, response, next);
    } catch (error) {
      if (error instanceof Error) viteDevServer.ssrFixStacktrace(error);
      next(error);
    }
  });
} else {
  // BUILD_DIRECTORY as in react-router.config.ts.
  const buildDirectory = process.env.BUILD_DIRECTORY ?? "build";
  const built = await import(`./${buildDirectory}/server/index.js`);
  appModule = async () => built;
  log = built.logger;
  // A built app is served as in production (whatever NODE_ENV says) and
  // refuses to start where a shop would be unsafe
  // (server/deployment-checks.ts): it says what to fix and exits.
  const problems = [
    ...(await built.deploymentProblems()),
    ...built.operatingSettingProblems(),
  ];
  if (problems.length > 0) {
    log.fatal(
      { problems },
      `not starting:\n${problems.map((problem) => `  - ${problem}`).join("\n")}`,
    );
    process.exit(1);
  }
  // Request ids, the log line and the metrics (docs/decisions/024, 025), and
  // the security headers (docs/decisions/012) go on the static files too.
  app.use(built.observeRequests);
  app.use(built.securityHeaders);
  // The build's brotli or gzip copy of a file (server/precompressed-assets.ts),
  // as the request's Accept-Encoding allows (brotli first), with Vary:
  // Accept-Encoding; the file itself otherwise. Hashed names under /assets
  // never change: cached for a year.
  const precompressed = (folder, serveStatic) =>
    expressStaticGzip(folder, {
      enableBrotli: true,
      orderPreference: ["br", "gzip"],
      serveStatic,
    });
  app.use(
    "/assets",
    precompressed(`${buildDirectory}/client/assets`, {
      immutable: true,
      maxAge: "1y",
    }),
  );
  // The build's other files (the favicon) are served by name: a request for
  // any other path (every page and API request) goes on to the app without
  // a look at the disk. The list is read once: a build never changes.
  const topLevelFiles = new Set(
    fs
      .readdirSync(`${buildDirectory}/client`, { withFileTypes: true })
      .filter((entry) => entry.isFile())
      .map((entry) => `/${entry.name}`),
  );
  const topLevelFile = precompressed(`${buildDirectory}/client`, {
    maxAge: "1h",
  });
  app.use((request, response, next) =>
    topLevelFiles.has(request.path)
      ? topLevelFile(request, response, next)
      : next(),
  );
  app.use(built.app);
}

const server = http.createServer();
const drain = new (await appModule()).HttpDrain(server);
server.on("request", drain.handle(app));
server.listen(port, host, () => {
  const where = ["0.0.0.0", "::"].includes(host)
    ? `every interface, port ${port}`
    : `${host.includes(":") ? `[${host}]` : host}:${port}`;
  log.info(`listening on ${where}`);
});

/** When the first stop signal came; 0 while running. */
let stopAskedAt = 0;

for (const signal of ["SIGINT", "SIGTERM"]) {
  process.on(signal, () => {
    if (stopAskedAt !== 0) {
      // Ctrl-C reaches the server from the terminal and again, moments
      // later, from the npm start wrapper that forwards it: one stop, not two.
      if (Date.now() - stopAskedAt < 500) return;
      log.warn(`${signal} again: stopping at once`);
      process.exit(1);
    }
    stopAskedAt = Date.now();
    appModule()
      .then((module) => module.stopGracefully(drain, signal, log))
      .then(closeDevServer)
      .then(
        () => {
          log.info("stopped");
          process.exit(0);
        },
        (error) => {
          log.error({ err: error }, "stopping failed");
          process.exit(1);
        },
      );
  });
}
