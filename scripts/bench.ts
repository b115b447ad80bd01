/** `npm run bench`: runs each section's benchmark in turn. Add a section by importing and awaiting it. */
import { benchBuilds } from "./bench-builds";
import { benchFit } from "./bench-fit";
import { benchPages } from "./bench-pages";
import { benchParts } from "./bench-parts";
import { benchPreview } from "./bench-preview";
import { benchRetrofit } from "./bench-retrofit";
import { benchThermal } from "./bench-thermal";

async function main(): Promise<void> {
  await benchThermal();
  await benchRetrofit();
  await benchParts();
  await benchBuilds();
  await benchPreview();
  await benchFit();
  await benchPages();
}

main().catch((e: unknown) => {
  console.error(e);
  process.exit(1);
});
