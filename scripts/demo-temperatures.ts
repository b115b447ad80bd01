/**
 * Prints, for every demo build and scenario, the junction, driver board and housing wall
 * temperatures at steady state, plus the charge time: the before/after record of a
 * physics change. Run: npx tsx --conditions=react-server scripts/demo-temperatures.ts
 */
import { partSchema, type Part } from "@/lib/parts";
import { buildDesignSchema, evaluateBuild, resolveBuild } from "@/lib/retrofit";
import { CATALOGUE, type CatalogueKey } from "./seed/catalogue-data";
import { demoBuilds } from "./seed/builds";

const ids = Object.fromEntries(Object.keys(CATALOGUE).map((k) => [k, k])) as Record<CatalogueKey, string>;
const parts = new Map<string, Part>();
for (const [key, input] of Object.entries(CATALOGUE)) parts.set(key, partSchema.parse({ ...input, visibility: "public" }));

const f = (x: number | undefined | null) => (x === undefined || x === null ? "—" : x.toFixed(1));
console.log("build | scenario | junction °C | driver °C | housing wall °C | housing air °C | charge h");
for (const b of demoBuilds(ids)) {
  const design = buildDesignSchema.parse(b.design);
  const r = resolveBuild(design, (id) => parts.get(id));
  const ev = evaluateBuild(r.build, { skipWhatItTakes: true, skipWarmup: true });
  for (const s of ev.scenarios) {
    const t = s.thermal?.temperaturesC ?? {};
    const charge = s.kind === "charging" ? f(ev.electrical.charge?.totalHours.value) : "";
    console.log(`${b.key} | ${s.name} | ${f(t.junction)} | ${f(t.driver)} | ${f(t.wall)} | ${f(t.air)} | ${charge}`);
  }
}
