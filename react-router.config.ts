import type { Config } from "@react-router/dev/config";

export default {
  // Server-side rendering of every page; loaders and actions run on the server.
  ssr: true,
  // BUILD_DIRECTORY lets two checkouts' test runs share one working tree
  // without overwriting each other's build (DEVELOPERS.md); server.js reads it too.
  buildDirectory: process.env.BUILD_DIRECTORY ?? "build",
} satisfies Config;
