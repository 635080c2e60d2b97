// The HTTP server: Express in front of React Router, in development (with
// Vite's dev middleware and hot reload) and in production (the built app).
import express from "express";

const developing = process.env.NODE_ENV === "development";
const port = Number.parseInt(process.env.PORT || "3000", 10);
// Every interface by default, as a deployment behind a proxy or in a container
// needs; `npm start` and `npm run dev` pass HOST=127.0.0.1 unless HOST is set
// (scripts/lib/serve-app.ts), so a laptop serves itself only.
const host = process.env.HOST || "0.0.0.0";

const app = express();
app.disable("x-powered-by");

if (developing) {
  const vite = await import("vite");
  const viteDevServer = await vite.createServer({
    server: { middlewareMode: true },
  });
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
  // A built app is served as in production (whatever NODE_ENV says) and
  // refuses to start where a shop would be unsafe
  // (server/deployment-checks.ts): it says what to fix and exits.
  const problems = await built.deploymentProblems();
  if (problems.length > 0) {
    console.error("[turnledger] not starting:");
    for (const problem of problems) console.error(`  - ${problem}`);
    process.exit(1);
  }
  // The security headers (docs/decisions/012) go on the static files too.
  app.use(built.securityHeaders);
  app.use(
    "/assets",
    express.static(`${buildDirectory}/client/assets`, {
      immutable: true,
      maxAge: "1y",
    }),
  );
  app.use(express.static(`${buildDirectory}/client`, { maxAge: "1h" }));
  app.use(built.app);
}

const server = app.listen(port, host, () => {
  const where = ["0.0.0.0", "::"].includes(host)
    ? `every interface, port ${port}`
    : `${host.includes(":") ? `[${host}]` : host}:${port}`;
  console.log(`[turnledger] listening on ${where}`);
});

for (const signal of ["SIGINT", "SIGTERM"]) {
  process.on(signal, () => {
    server.close(() => process.exit(0));
    setTimeout(() => process.exit(0), 3_000).unref();
  });
}
