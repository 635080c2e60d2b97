import { serveApp } from "./lib/serve-app";

// npm start: MariaDB, migrations, demo data, mail fake, production build, server on PORT (3000).
await serveApp("production");
