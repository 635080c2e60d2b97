import { reactRouter } from "@react-router/dev/vite";
import tailwindcss from "@tailwindcss/vite";
import { defineConfig } from "vite";

export default defineConfig(({ isSsrBuild }) => ({
  // The server build starts from our Express app, which wraps React Router.
  build: {
    rollupOptions: isSsrBuild ? { input: "./server/app.ts" } : undefined,
  },
  resolve: { tsconfigPaths: true },
  plugins: [tailwindcss(), reactRouter()],
}));
