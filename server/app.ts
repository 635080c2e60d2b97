import "react-router";
import { createRequestHandler } from "@react-router/express";
import compression from "compression";
import express from "express";

declare module "react-router" {
  interface AppLoadContext {
    /** The client's IP address (from X-Forwarded-For only when TRUST_PROXY is set). */
    clientAddress: string;
  }
}

export const app = express();

app.disable("x-powered-by");
if (process.env.TRUST_PROXY) {
  // e.g. TRUST_PROXY=1 behind one load balancer; see README "Scaling out".
  const hops = Number(process.env.TRUST_PROXY);
  app.set("trust proxy", Number.isNaN(hops) ? process.env.TRUST_PROXY : hops);
}
app.use(compression());

// Server-Timing: how long the app took for each answer (read by `npm run bench` and browsers' dev tools).
app.use((_request, response, next) => {
  const started = process.hrtime.bigint();
  const writeHead = response.writeHead;
  response.writeHead = function (
    this: typeof response,
    ...args: Parameters<typeof writeHead>
  ) {
    const milliseconds = Number(process.hrtime.bigint() - started) / 1e6;
    this.setHeader("Server-Timing", `app;dur=${milliseconds.toFixed(3)}`);
    return writeHead.apply(this, args);
  } as typeof writeHead;
  next();
});

app.use(
  createRequestHandler({
    build: () => import("virtual:react-router/server-build"),
    getLoadContext(request) {
      return {
        clientAddress: request.ip ?? request.socket.remoteAddress ?? "unknown",
      };
    },
  }),
);
