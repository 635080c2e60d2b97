import { serveApp } from "./lib/serve-app";

// npm run dev: as npm start, but Vite's dev server with hot reload instead of a build.
await serveApp("development");
