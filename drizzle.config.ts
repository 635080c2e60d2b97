import { defineConfig } from "drizzle-kit";

// Only `drizzle-kit generate` uses this file: it compares the schema with the
// committed migrations and needs no running database.
export default defineConfig({
  dialect: "mysql",
  schema: "./app/db/schema.ts",
  out: "./drizzle",
});
