/** `npm run bench`: runs each section's benchmark in turn. Add a section by importing and awaiting it. */
import { cpus, loadavg } from "node:os";
import { benchBuilds } from "./bench-builds";
import { benchFit } from "./bench-fit";
import { benchPages } from "./bench-pages";
import { benchParts } from "./bench-parts";
import { benchPreview } from "./bench-preview";
import { benchRetrofit } from "./bench-retrofit";
import { targetSummary } from "./bench-targets";
import { benchThermal } from "./bench-thermal";

/** The figures are taken under whatever else the machine runs: say how busy it was. */
const load = () => `load average ${loadavg().map((x) => x.toFixed(2)).join(", ")} (1, 5, 15 min) on ${cpus().length} cores`;

async function main(): Promise<void> {
  console.log(`[bench] start: ${load()}`);
  await benchThermal();
  await benchRetrofit();
  await benchParts();
  await benchBuilds();
  await benchPreview();
  await benchFit();
  await benchPages();
  console.log(targetSummary().join("\n"));
  console.log(`[bench] end: ${load()}`);
}

main().catch((e: unknown) => {
  console.error(e);
  process.exit(1);
});
