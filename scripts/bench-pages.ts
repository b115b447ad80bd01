/**
 * Light pages: the JavaScript each page makes the browser load before it is interactive,
 * read from the production build (`.next`, made by `npm run build` or `npm test`): the
 * framework's root chunks plus the client chunks of the page and every layout, error and
 * not-found boundary above it, each gzipped (level 6, as a reverse proxy would send it).
 * Chunks loaded later on demand (dynamic imports) are not counted.
 */
import { existsSync, readdirSync, readFileSync, statSync } from "node:fs";
import { join } from "node:path";
import { runInNewContext } from "node:vm";
import { gzipSync } from "node:zlib";

const NEXT = ".next";
export const PAGE_BUDGET_KB = 180;

function manifests(dir: string): string[] {
  const out: string[] = [];
  for (const entry of readdirSync(dir)) {
    const full = join(dir, entry);
    if (statSync(full).isDirectory()) out.push(...manifests(full));
    else if (entry === "page_client-reference-manifest.js") out.push(full);
  }
  return out;
}

const gzCache = new Map<string, number>();
function gzBytes(file: string): number {
  let n = gzCache.get(file);
  if (n === undefined) {
    n = gzipSync(readFileSync(join(NEXT, file)), { level: 6 }).length;
    gzCache.set(file, n);
  }
  return n;
}

export type PageWeight = { page: string; kb: number; chunks: number };

export function pageWeights(): PageWeight[] {
  const build = JSON.parse(readFileSync(join(NEXT, "build-manifest.json"), "utf8")) as { rootMainFiles: string[] };
  const rows: PageWeight[] = [];
  for (const file of manifests(join(NEXT, "server", "app"))) {
    const sandbox: { globalThis?: unknown; __RSC_MANIFEST?: Record<string, { entryJSFiles?: Record<string, string[]> }> } = {};
    sandbox.globalThis = sandbox;
    runInNewContext(readFileSync(file, "utf8"), sandbox);
    for (const [page, m] of Object.entries(sandbox.__RSC_MANIFEST ?? {})) {
      if (page.startsWith("/_") || page.includes("/api/")) continue;
      const files = new Set<string>(build.rootMainFiles);
      for (const list of Object.values(m.entryJSFiles ?? {})) for (const f of list) files.add(f);
      const bytes = [...files].reduce((sum, f) => sum + gzBytes(f), 0);
      rows.push({ page: page.replace(/\/page$/, "") || "/", kb: bytes / 1000, chunks: files.size });
    }
  }
  return rows.sort((a, b) => b.kb - a.kb);
}

export async function benchPages(): Promise<void> {
  console.log("\n## Light pages: first-load JavaScript per page (gzipped, from the production build)");
  if (!existsSync(join(NEXT, "build-manifest.json"))) {
    console.log("no production build in .next: run `npm run build` (or `npm test`) first");
    return;
  }
  const rows = pageWeights();
  for (const r of rows) console.log(`${r.kb.toFixed(1).padStart(7)} kB  ${r.kb <= PAGE_BUDGET_KB ? "ok  " : "OVER"}  ${r.page}  (${r.chunks} chunks)`);
  const over = rows.filter((r) => r.kb > PAGE_BUDGET_KB);
  const heaviest = rows[0];
  console.log(`${rows.length} pages; heaviest ${heaviest?.page} ${heaviest?.kb.toFixed(1)} kB; budget ${PAGE_BUDGET_KB} kB; ${over.length} over`);
}


