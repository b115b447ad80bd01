import { defineConfig } from "drizzle-kit";

// Only `drizzle-kit generate` uses this file; migrations are applied by scripts/migrate.ts.
export default defineConfig({
  dialect: "mysql",
  schema: "./db/schema.ts",
  out: "./drizzle",
});
