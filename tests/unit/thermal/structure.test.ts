import { readdirSync, readFileSync, statSync } from "node:fs";
import { dirname, join, relative, resolve } from "node:path";
import { describe, expect, it } from "vitest";

const ROOT = resolve(__dirname, "../../../lib/thermal");

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = join(dir, name);
    return statSync(p).isDirectory() ? files(p) : p.endsWith(".ts") ? [p] : [];
  });
}

/** Relative imports of a file (value and type imports, re-exports included), resolved to files. */
function importsOf(file: string): string[] {
  const text = readFileSync(file, "utf8");
  const out: string[] = [];
  for (const m of text.matchAll(/(?:import|export)\s[^;]*?from\s+"(\.{1,2}\/[^"]+)"/g)) {
    const base = resolve(dirname(file), m[1]!);
    for (const candidate of [`${base}.ts`, join(base, "index.ts")]) {
      try {
        if (statSync(candidate).isFile()) {
          out.push(candidate);
          break;
        }
      } catch {
        // not this one
      }
    }
  }
  return out;
}

describe("engine module structure", () => {
  const all = files(ROOT);
  const graph = new Map(all.map((f) => [f, importsOf(f)]));

  it("lib/thermal has no import cycles (type-only imports counted too)", () => {
    const state = new Map<string, 0 | 1 | 2>();
    const cycles: string[] = [];
    const visit = (f: string, path: string[]) => {
      state.set(f, 1);
      for (const g of graph.get(f) ?? []) {
        if (state.get(g) === 1) cycles.push([...path.slice(path.indexOf(g)), g].map((x) => relative(ROOT, x)).join(" → "));
        else if (!state.get(g)) visit(g, [...path, g]);
      }
      state.set(f, 2);
    };
    for (const f of all) if (!state.get(f)) visit(f, [f]);
    expect(cycles).toEqual([]);
  });

  it("the natural-convection correlations live in one leaf module used by the elements, the kernel and the heatsink model", () => {
    const leaf = join(ROOT, "correlations.ts");
    expect(graph.get(leaf)).toEqual([]);
    for (const user of ["elements/natural-convection.ts", "solver/convection-kernel.ts", "elements/heatsink.ts"]) {
      expect(graph.get(join(ROOT, user)), user).toContain(leaf);
    }
    // No other file writes a Churchill–Chu coefficient of its own.
    for (const f of all) {
      if (f === leaf) continue;
      expect(readFileSync(f, "utf8"), relative(ROOT, f)).not.toMatch(/0\.49\d? *[:)]|0\.559 *[:)]|576 \/ \(/);
    }
  });
});
