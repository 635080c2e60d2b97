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

app.use(
  createRequestHandler({
    build: () => import("virtual:react-router/server-build"),
    getLoadContext(request) {
      return { clientAddress: request.ip ?? request.socket.remoteAddress ?? "unknown" };
    },
  }),
);
