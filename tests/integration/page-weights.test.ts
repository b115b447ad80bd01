import { describe, expect, it } from "vitest";
import { PAGE_BUDGET_KB, pageWeights } from "../../scripts/bench-pages";

// Read from the production build the test run serves (npm test builds it first): the
// JavaScript each page needs before it is interactive, gzipped. A size, not a time, so it
// belongs in the tests; npm run bench prints the same table.
describe("light pages", () => {
  it(`every page's first-load JavaScript is at most ${PAGE_BUDGET_KB} kB gzipped`, () => {
    const rows = pageWeights();
    expect(rows.length).toBeGreaterThan(20);
    const over = rows.filter((r) => r.kb > PAGE_BUDGET_KB).map((r) => `${r.page} ${r.kb.toFixed(1)} kB`);
    expect(over).toEqual([]);
  });
});
