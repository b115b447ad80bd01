// The API's handlers as the file system declares them: "METHOD /api/…" for every method a
// route file under app/api exports. The access matrix and the fuzz test are driven by it.
import { readdirSync, readFileSync } from "node:fs";
import { join, relative, sep } from "node:path";

const API = join(process.cwd(), "app", "api");
const METHOD = /export\s+(?:const|async\s+function|function)\s+(GET|HEAD|POST|PUT|PATCH|DELETE|OPTIONS)\b/g;

export type Handler = { key: string; method: string; url: string; file: string; source: string };

export function routeHandlers(): Handler[] {
  const out: Handler[] = [];
  const walk = (dir: string): void => {
    for (const entry of readdirSync(dir, { withFileTypes: true })) {
      const full = join(dir, entry.name);
      if (entry.isDirectory()) walk(full);
      else if (entry.name === "route.ts") {
        const url = ("/api/" + relative(API, dir).split(sep).filter((s) => !/^\(.*\)$/.test(s)).join("/")).replace(/\/$/, "");
        const source = readFileSync(full, "utf8");
        for (const m of source.matchAll(METHOD)) out.push({ key: `${m[1]} ${url}`, method: m[1]!, url, file: full, source });
      }
    }
  };
  walk(API);
  return out.sort((a, b) => a.key.localeCompare(b.key));
}
