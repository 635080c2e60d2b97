import { reactRouter } from "@react-router/dev/vite";
import tailwindcss from "@tailwindcss/vite";
import { defineConfig } from "vite";

export default defineConfig(({ isSsrBuild }) => ({
  // The server build starts from our Express app, which wraps React Router.
  build: {
    rollupOptions: isSsrBuild ? { input: "./server/app.ts" } : undefined,
  },
  resolve: { tsconfigPaths: true },
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
  plugins: [tailwindcss(), reactRouter()],
}));
