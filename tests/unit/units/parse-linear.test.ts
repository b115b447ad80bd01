import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { csvHeaders, parsePartsCsv } from "@/lib/parts/csv";
import { MAX_VALUE_CHARS, parseQuantity, QUANTITIES, unitField } from "@/lib/units";

// The largest body the server reads (server/route.ts): a single value may be that long.
const MAX_BODY_CHARS = 1_000_000;

/**
 * Milliseconds one call takes: the fastest of three, so a busy machine does not fail it,
 * while a pattern that backtracks quadratically (minutes at this size) cannot pass.
 */
function timed(run: () => unknown): number {
  let best = Number.POSITIVE_INFINITY;
  for (let i = 0; i < 3; i += 1) {
    const start = performance.now();
    run();
    best = Math.min(best, performance.now() - start);
  }
  return best;
}

// Texts that made backtracking patterns take quadratic time: long runs of one character
// class followed by something that makes the match fail at the very end.
const hostile = fc
  .tuple(
    fc.constantFrom("1", "", "-", "."),
    fc.constantFrom(" ", "1", "\t", "°", "/", "%", "e"),
    fc.integer({ min: 10_000, max: MAX_BODY_CHARS }),
    fc.constantFrom("x", "%x", " %", "!", "mm!", "e"),
  )
  .map(([head, run, count, tail]) => head + run.repeat(count) + tail);

describe("unit parsing takes time in proportion to the value, whatever it holds", () => {
  it("parses a value the size of the largest body in well under 50 ms (property)", () => {
    fc.assert(
      fc.property(hostile, fc.constantFrom(...QUANTITIES), (text, quantity) => {
        const ms = timed(() => parseQuantity(text, quantity));
        expect(ms).toBeLessThan(50);
      }),
      { numRuns: 40 },
    );
  });

  it("refuses an over-long value with a message, through the same zod field the API uses", () => {
    const field = unitField("length");
    const parsed = field.safeParse(`1${" ".repeat(MAX_BODY_CHARS)}x`);
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues[0]?.message).toMatch(`longer than ${MAX_VALUE_CHARS} characters`);
    // A normal value still reads.
    expect(field.parse("20 mm")).toBeCloseTo(0.02, 12);
    expect(parseQuantity("80 %", "percent")).toEqual({ ok: true, si: 0.8 });
    expect(parseQuantity("80%", "percent")).toEqual({ ok: true, si: 0.8 });
  });

  it("reads a CSV of long runs of spaces, in its header and its cells, in time proportional to its size", () => {
    const long = (n: number) => `1${" ".repeat(n)}x`;
    const headers = csvHeaders("emitter");
    const sheet = (n: number) => `${long(n)},${headers.slice(1).join(",")}\n${headers.map(() => long(n)).join(",")}\n`;
    const good = `${headers.join(",")}\n${headers.map(() => long(50_000)).join(",")}\n`;
    // A quadratic pattern takes tens of seconds on these; linear reading takes milliseconds.
    expect(timed(() => parsePartsCsv(sheet(50_000), "emitter"))).toBeLessThan(1000);
    expect(timed(() => parsePartsCsv(good, "emitter"))).toBeLessThan(1000);
    const bad = parsePartsCsv(sheet(50_000), "emitter");
    expect(bad.headerErrors[0]?.message).toMatch(/longer than 200 characters/);
    const rows = parsePartsCsv(good, "emitter").rows;
    expect(rows).toHaveLength(1);
    expect(rows[0]?.ok).toBe(false);
  });
});
