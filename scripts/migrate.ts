// Applies the committed SQL migrations in drizzle/ to the database named by the environment.
import { migrate } from "drizzle-orm/mysql2/migrator";
import { loadEnvFile } from "./load-env";

loadEnvFile();

async function main(): Promise<void> {
  const { db, pool } = await import("@/db/client");
  await migrate(db(), { migrationsFolder: "./drizzle" });
  await pool().end();
  console.log(`[migrate] ${process.env.DATABASE_NAME ?? "sinkwise"} is up to date`);
}

main().catch((error: unknown) => {
  console.error("[migrate] failed:", error instanceof Error ? error.message : error);
  process.exit(1);
});
