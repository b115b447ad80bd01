// Loads the demo scenario (idempotent): run by npm start and npm test, or `npm run db:seed`.
import { loadEnvFile } from "./load-env";

loadEnvFile();

async function main(): Promise<void> {
  const { seedAccounts, DEMO_ACCOUNTS } = await import("./seed/accounts");
  const { seedCatalogue } = await import("./seed/catalogue");
  const { seedBuilds } = await import("./seed/builds");
  const { seedReviews } = await import("./seed/reviews");
  const { seedBench, seedBenchHold, seedCalibration } = await import("./seed/bench");
  const { seedClassroom, DEMO_STUDENTS } = await import("./seed/classroom");
  const { pool } = await import("@/db/client");
  const password = process.env.DEMO_PASSWORD;
  if (!password || password.length < 10) throw new Error("DEMO_PASSWORD (at least 10 characters) is not set; run scripts/env.sh");
  const accounts = await seedAccounts(password);
  const catalogue = await seedCatalogue({ adminId: accounts.admin });
  // A database seeded before checks were recorded called invented parts verified: clear
  // every mark no recorded check stands behind.
  const { clearUnbackedVerifiedMarks } = await import("@/db/queries/part-verifications");
  const cleared = await clearUnbackedVerifiedMarks();
  const builds = await seedBuilds({ makerId: accounts.maker, ids: catalogue });
  await seedReviews({ ids: accounts, builds });
  const bench = await seedBench({ makerId: accounts.maker, ids: catalogue });
  const hold = await seedBenchHold({ makerId: accounts.maker, buildId: builds["lantern-strap"] });
  const calibrated = await seedCalibration({ makerId: accounts.maker, buildId: builds["lantern-strap"], runId: hold });
  const classCreated = await seedClassroom({ password, instructorId: accounts.instructor, builds });
  await pool().end();
  console.log(`[seed] ${DEMO_ACCOUNTS.length} demo accounts ready`);
  console.log(`[seed] ${Object.keys(catalogue).length} catalogue parts ready (public estimates, not verified)${cleared ? `; ${cleared} verified marks without a recorded check cleared` : ""}`);
  if (hold) console.log("[seed] the finished lantern held against its measured warm-up");
  if (calibrated) {
    const c = calibrated;
    const interval = c.low !== null && c.high !== null ? ` (95 % ${c.low.toFixed(2)}–${c.high.toFixed(2)})` : "";
    console.log(`[seed] the lantern calibrated to that warm-up as revision ${c.revision}: ${c.name} × ${c.factor.toFixed(2)}${interval}, misfit ${c.rmsBeforeK.toFixed(1)} K → ${c.rmsAfterK.toFixed(1)} K over ${c.readingCount} readings`);
  }
  if (bench) console.log(`[seed] bench run of the salvaged sink: ${bench.sinkToAirKPerW.toFixed(2)} K/W (95 % ${bench.low.toFixed(2)}–${bench.high.toFixed(2)}), ${bench.heatCapacityJPerK.toFixed(0)} J/K`);
  console.log(`[seed] ${Object.keys(builds).length} demo builds ready (with their heat-path variants), a finished review and a queued one`);
  console.log(`[seed] the evening course ${classCreated ? "created" : "ready"}: ${DEMO_STUDENTS.length} students, two worked examples, an exercise with two hand-ins`);
}

main().catch((error: unknown) => {
  console.error("[seed] failed:", error instanceof Error ? error.message : error);
  process.exit(1);
});
