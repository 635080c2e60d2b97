import path from "node:path";
import { reactRouter } from "@react-router/dev/vite";
import tailwindcss from "@tailwindcss/vite";
import { createLogger, defineConfig } from "vite";
import routes from "./app/routes.js";
import reactRouterConfig from "./react-router.config.js";
import {
  allowEntryExtension,
  appModuleChunkName,
  layoutRoutes,
} from "./server/app-module-chunks.js";
import { precompressClientBuild } from "./server/precompressed-assets.js";
import { sideEffectFreeAppModules } from "./server/side-effect-free-app-modules.js";

/**
 * Vite's logger without one warning we cannot act on: @react-router/dev 7.18
 * starts its own Vite servers with `envFile: false`, which Vite 8 reports as
 * deprecated on each start (fixed in React Router 8: remix-run/react-router
 * pull request 15230). Its route compiler takes our logger; the server that
 * reads react-router.config.ts does not, so `react-router build` still prints
 * the warning from there. Drop this filter when React Router passes `envDir`.
 */
function viteLogger() {
  const logger = createLogger();
  const warn = logger.warn.bind(logger);
  logger.warn = (message, options) => {
    if (message.includes("The `envFile` option is deprecated")) return;
    warn(message, options);
  };
  return logger;
}

export default defineConfig(({ isSsrBuild }) => ({
  customLogger: viteLogger(),
  // The server build starts from our Express app, which wraps React Router.
  build: {
    rollupOptions: isSsrBuild
      ? { input: "./server/app.ts" }
      : {
          output: {
            // The modules only root or a layout loads, in one chunk beside it (server/app-module-chunks.ts).
            codeSplitting: {
              groups: [
                {
                  name: appModuleChunkName("app", layoutRoutes(routes)),
                  includeDependenciesRecursively: false,
                },
              ],
            },
          },
        },
  },
  resolve: {
    tsconfigPaths: true,
    // In the browser, Zod comes configured for the Content-Security-Policy (app/lib/zod-in-browser.ts).
    alias: isSsrBuild
      ? []
      : [
          {
            find: /^zod$/,
            replacement: path.resolve("app/lib/zod-in-browser.ts"),
          },
        ],
  },
  // Pre-bundle the browser's libraries up front, so the dev server never finds one
  // mid-session and reloads with a second copy of React.
  optimizeDeps: {
    include: [
      "react",
      "react-dom",
      "react-dom/client",
      "react-router",
      "@tanstack/react-table",
      "@conform-to/react",
      "@conform-to/zod/v4",
      "zod",
    ],
  },
  plugins: [
    tailwindcss(),
    isSsrBuild ? [] : allowEntryExtension(),
    reactRouter(),
    // The browser's pages leave out app modules they use nothing of (server/side-effect-free-app-modules.ts).
    isSsrBuild ? [] : sideEffectFreeAppModules("app"),
    // Brotli and gzip copies beside the browser's files (server/precompressed-assets.ts).
    isSsrBuild
      ? precompressClientBuild(`${reactRouterConfig.buildDirectory}/client`)
      : [],
  ],
}));
