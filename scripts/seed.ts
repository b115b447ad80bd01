// Loads the demo scenario (idempotent): run by npm start and npm test, or `npm run db:seed`.
import { loadEnvFile } from "./load-env";

loadEnvFile();

async function main(): Promise<void> {
  const { seedAccounts, DEMO_ACCOUNTS } = await import("./seed/accounts");
  const { seedCatalogue } = await import("./seed/catalogue");
  const { seedBuilds } = await import("./seed/builds");
  const { seedReviews } = await import("./seed/reviews");
  const { seedBench, seedBenchHold } = await import("./seed/bench");
  const { pool } = await import("@/db/client");
  const password = process.env.DEMO_PASSWORD;
  if (!password || password.length < 10) throw new Error("DEMO_PASSWORD (at least 10 characters) is not set; run scripts/env.sh");
  const accounts = await seedAccounts(password);
  const catalogue = await seedCatalogue({ adminId: accounts.admin });
  const builds = await seedBuilds({ makerId: accounts.maker, ids: catalogue });
  await seedReviews({ ids: accounts, builds });
  const bench = await seedBench({ makerId: accounts.maker, ids: catalogue });
  const hold = await seedBenchHold({ makerId: accounts.maker, buildId: builds["lantern-strap"] });
  await pool().end();
  console.log(`[seed] ${DEMO_ACCOUNTS.length} demo accounts ready`);
  console.log(`[seed] ${Object.keys(catalogue).length} catalogue parts ready (public, verified)`);
  if (hold) console.log("[seed] the finished lantern held against its measured warm-up");
  if (bench) console.log(`[seed] bench run of the salvaged sink: ${bench.sinkToAirKPerW.toFixed(2)} K/W (95 % ${bench.low.toFixed(2)}–${bench.high.toFixed(2)}), ${bench.heatCapacityJPerK.toFixed(0)} J/K`);
  console.log(`[seed] ${Object.keys(builds).length} demo builds ready (with their heat-path variants), a finished review and a queued one`);
}

main().catch((error: unknown) => {
  console.error("[seed] failed:", error instanceof Error ? error.message : error);
  process.exit(1);
});
