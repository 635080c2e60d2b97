import type { Config } from "@react-router/dev/config";

export default {
  // Server-side rendering of every page; loaders and actions run on the server.
  ssr: true,
  // BUILD_DIRECTORY lets two checkouts' test runs share one working tree
  // without overwriting each other's build (DEVELOPERS.md); server.js reads it too.
  buildDirectory: process.env.BUILD_DIRECTORY ?? "build",
  // React Router 8's behaviours, each left off on purpose (today's v7 ones),
  // so every build stops asking; turning one on is a change of its own, with
  // its tests (https://reactrouter.com/v7/upgrading/future).
  future: {
    v8_middleware: false,
    v8_splitRouteModules: false,
    v8_viteEnvironmentApi: false,
    v8_passThroughRequests: false,
    v8_trailingSlashAwareDataRequests: false,
  },
} satisfies Config;
