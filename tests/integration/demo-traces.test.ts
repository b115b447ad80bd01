import { beforeAll, describe, expect, it } from "vitest";
import { isTrace, type Trace } from "@/lib/thermal";
import { nodeBalanceTrace } from "@/lib/retrofit/derivations";
import { Client, signedIn } from "../support/http";
import { sourceProblem } from "../support/sources";
import { solvedWithTraces } from "../support/traces";

/**
 * Every trace a reader can open on a demo build's Budget names a source they can look up:
 * a book (authors, title, edition, equation or table), a paper, a standard and clause, or an
 * honest mark (`common practice`, `from memory — check against a copy`, `as entered`).
 * Never a file of this repository, a design document, or an algorithm's name on its own (a
 * search may name its method when the model it searches cites its sources link by link).
 */
/** Every trace anywhere in a JSON value (and the traces inside traces). */
function collect(value: unknown, path: string, out: { path: string; trace: Trace }[]): void {
  if (Array.isArray(value)) value.forEach((v, i) => collect(v, `${path}[${i}]`, out));
  else if (value && typeof value === "object") {
    if (isTrace(value)) out.push({ path, trace: value });
    for (const [k, v] of Object.entries(value)) collect(v, `${path}.${k}`, out);
  }
}

let maker: Client;
let demo: { id: string; title: string }[] = [];

beforeAll(async () => {
  maker = await signedIn("maker@sinkwise.test");
  const list = await maker.get("/api/v1/builds");
  expect(list.status).toBe(200);
  const mine = (list.body as unknown as { mine: { id: string; title: string }[] }).mine;
  // The demo workshop's builds (the seed's titles); other tests' builds are left out.
  demo = mine.filter((b) => /lantern|headlamp|inspection lamp/i.test(b.title) && !/test|E2E/i.test(b.title));
});

describe("the sources behind every figure of the demo builds", () => {
  it("tells a good source from a bad one", () => {
    expect(sourceProblem('Incropera, DeWitt, Bergman & Lavine, "Fundamentals of Heat and Mass Transfer", 6th ed., eq. 3.6')).toBeNull();
    expect(sourceProblem("ISO 13732-1:2006, clause 4")).toBeNull();
    expect(sourceProblem("common practice (LED trade figures)")).toBeNull();
    expect(sourceProblem("")).toBe("empty source");
    expect(sourceProblem("common practice, see PRODUCT.md")).toBe("cites a repository file or design document");
    expect(sourceProblem("lib/thermal steady solve")).toBe("cites a repository file or design document");
    expect(sourceProblem("Illinois regula falsi")).toBe("names no book, paper, standard or honest mark");
  });

  it("walks every trace of every demo build's evaluation, node temperatures included", async () => {
    expect(demo.length).toBeGreaterThanOrEqual(7);
    const bad: string[] = [];
    let count = 0;
    for (const b of demo) {
      // As the Budget reads it: the figures, then the working behind them.
      const evaluation = await solvedWithTraces(maker, b.id);
      const found: { path: string; trace: Trace }[] = [];
      collect(evaluation, "evaluation", found);
      for (const s of evaluation.scenarios) {
        if (!s.thermal) continue;
        for (const n of s.thermal.nodes) {
          const t = nodeBalanceTrace(s.thermal, n.id, s.network?.ambientC ?? 25);
          if (t) collect(t, `${s.id}/node:${n.id}`, found);
        }
      }
      for (const { path, trace } of found) {
        count++;
        const problem = sourceProblem(trace.source);
        if (problem) bad.push(`${b.title} ${path} (${trace.formula}): ${problem}: "${trace.source}"`);
      }
    }
    expect(count).toBeGreaterThan(100);
    expect([...new Set(bad.map((x) => x.replace(/\[\d+\]/g, "[]")))]).toEqual([]);
  });

  it("opens every figure of Side by side to its derivation, temperatures included", async () => {
    const lanterns = demo.filter((b) => /square lantern/i.test(b.title)).slice(0, 3);
    expect(lanterns.length).toBe(3);
    const r = await maker.get(`/api/v1/compare?items=${lanterns.map((b) => b.id).join(",")}`);
    expect(r.status).toBe(200);
    const figures = (r.body as unknown as { figures: { key: string; kind: string; values: unknown[]; traces: (Trace | null)[] }[] }).figures;
    const temperatures = figures.filter((f) => f.key.includes("/temperature:"));
    expect(temperatures.length).toBeGreaterThan(3);
    const bad: string[] = [];
    for (const f of figures) {
      if (f.kind === "verdict" || f.key.startsWith("build/cost") || f.key.startsWith("build/saving")) continue;
      f.values.forEach((v, i) => {
        const t = f.traces[i];
        if (typeof v === "number" && !t) bad.push(`${f.key}[${i}]: no derivation`);
        if (t) {
          const found: { path: string; trace: Trace }[] = [];
          collect(t, f.key, found);
          for (const x of found) {
            const problem = sourceProblem(x.trace.source);
            if (problem) bad.push(`${x.path}: ${problem}`);
          }
        }
      });
    }
    expect([...new Set(bad)]).toEqual([]);
  });
});
