import type { Config } from "@react-router/dev/config";

export default {
  // Server-side rendering of every page; loaders and actions run on the server.
  ssr: true,
} satisfies Config;
