import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ARTEFACTS, launch, type Page, signInThroughForm } from "../support/browser";
import { BASE_URL, Client, signedIn } from "../support/http";
import { createParts, newBuild, retrofitDesign } from "../support/retrofit";

// The demo maker compares three ways of cooling the driver, asks the demo reviewer for a
// review; the reviewer pins a comment to the heat path and records a verdict; the maker sees it.
let maker: Awaited<ReturnType<typeof launch>>;
let reviewer: Awaited<ReturnType<typeof launch>>;
// The demo lantern and its two variants (scripts/seed/builds.ts), or, on a database without the
// demo builds, the same three made through the API.
const DEMO = { strapped: "Square lantern, 2-cell Li-ion", pressed: "Square lantern — driver pressed to the wall", floating: "Square lantern — driver floating free" };
const titles = { ...DEMO };
const ids: { strapped: string; pressed: string; floating: string } = { strapped: "", pressed: "", floating: "" };

beforeAll(async () => {
  const api: Client = await signedIn("maker@sinkwise.test");
  const mine = (await api.get("/api/v1/builds")).body.mine as { id: string; title: string }[];
  const find = (t: string) => mine.find((b) => b.title === t)?.id;
  if (find(DEMO.strapped) && find(DEMO.pressed) && find(DEMO.floating)) {
    ids.strapped = find(DEMO.strapped)!;
    ids.pressed = find(DEMO.pressed)!;
    ids.floating = find(DEMO.floating)!;
  } else {
    const parts = await createParts(api, "shared");
    titles.strapped = `Square lantern ${Date.now().toString(36)}`;
    ids.strapped = await newBuild(api, { title: titles.strapped, design: retrofitDesign(parts, "strapped") });
    for (const [key, note, cooling] of [["pressed", "driver pressed to the wall", "ground-plane-to-wall"], ["floating", "driver floating free", "floating"]] as const) {
      const r = await api.post(`/api/v1/builds/${ids.strapped}/fork`, { variantNote: note });
      ids[key] = (r.body.build as { id: string }).id;
      titles[key] = `${titles.strapped} — ${note}`;
      expect((await api.patch(`/api/v1/builds/${ids[key]}`, { design: retrofitDesign(parts, cooling), note })).status).toBe(200);
    }
  }
  [maker, reviewer] = await Promise.all([launch(), launch()]);
}, 120_000);

afterAll(async () => {
  await maker?.close();
  await reviewer?.close();
});

async function shot(page: Page, name: string) {
  await page.screenshot({ path: `${ARTEFACTS}/${name}.png`, fullPage: true });
}

describe("Side by side and the Review desk in chromium", () => {
  it("the maker compares the three driver-cooling variants and saves the comparison", async () => {
    const page = await maker.browser.newPage();
    await signInThroughForm(page, "maker@sinkwise.test");
    await page.goto(`${BASE_URL}/compare`);
    for (const t of [titles.strapped, titles.pressed, titles.floating]) await page.getByLabel(`Compare ${t}`, { exact: true }).check();
    await page.getByRole("button", { name: "Compare side by side" }).click();
    await page.getByTestId("compare-figures").waitFor({ timeout: 60_000 });
    expect(await page.getByTestId("compare-column").count()).toBe(3);
    // The summary comes first and says who wins in each mode, in words from the numbers.
    const first = page.getByTestId("compare-summary-lines").locator("li").first();
    await expect.poll(() => first.textContent()).toMatch(/^Driver (strapped to the housing|pressed to the wall|floating free) wins in /);
    // The mounting difference is listed first.
    const firstDiff = page.getByTestId("compare-differences").locator("tr").first();
    await expect.poll(() => firstDiff.textContent()).toContain("Driver cooling");
    await expect.poll(() => firstDiff.textContent()).toContain("floating free in the housing's air");
    await page.getByTestId("compare-warmup-chart").locator("canvas").waitFor();
    // Every column's heat path for the same scenario, and a ladder for each limited place (not only the emitter's).
    expect(await page.getByTestId("compare-heat-paths").getByTestId("heat-path-diagram").count()).toBe(3);
    await page.getByTestId("compare-place-ladders").getByRole("region", { name: "Ladder, driver board" }).locator("canvas").first().waitFor();
    await shot(page, "compare-driver-cooling");
    await page.getByRole("button", { name: "Save the comparison" }).click();
    await page.waitForURL(/\/compare\?saved=/);
    await page.getByTestId("compare-figures").waitFor({ timeout: 60_000 });
    await page.close();
  });

  it("the maker requests a review from the demo reviewer", async () => {
    const page = await maker.browser.newPage();
    await page.goto(`${BASE_URL}/builds/${ids.strapped}/reviews`);
    const form = page.getByRole("form", { name: "Request a review" });
    await form.getByLabel("Reviewer's e-mail").fill("reviewer@sinkwise.test");
    await form.getByLabel("Note for the reviewer").fill("Which driver cooling holds on high?");
    await form.getByRole("button", { name: "Request the review" }).click();
    await page.getByRole("status").filter({ hasText: "Review requested from" }).waitFor();
    await page.getByTestId("build-review").first().waitFor();
    await shot(page, "review-requested");
    await page.close();
  });

  it("the maker shares the Budget read-only; the link opens without signing in and stops when revoked", async () => {
    const page = await maker.browser.newPage();
    await page.goto(`${BASE_URL}/builds/${ids.strapped}/reviews`);
    const panel = page.getByRole("region", { name: "Share links" });
    await panel.getByLabel("Expires after (days)").fill("7");
    await panel.getByRole("button", { name: "Create a link" }).click();
    const url = await panel.getByTestId("share-url").inputValue();
    expect(url).toMatch(/\/share\/[A-Za-z0-9_-]{43}$/);
    // The reviewer's browser has not signed in yet: it stands for anyone with the link.
    const anon = await reviewer.browser.newPage();
    await anon.goto(url.replace(/^https?:\/\/[^/]+/, BASE_URL));
    await anon.getByTestId("shared-budget").waitFor();
    await anon.getByTestId("overall-verdict").waitFor({ timeout: 30_000 });
    await anon.getByTestId("ladder-chart").locator("canvas").waitFor();
    await shot(anon, "share-link-view");
    await panel.getByRole("button", { name: "Revoke" }).first().click();
    await panel.getByText("revoked").first().waitFor();
    await anon.reload();
    await anon.getByText("This share link was revoked by the build's owner.").waitFor();
    await anon.close();
    await page.close();
  });

  it("the reviewer compares the three variants, reads the summary, pins a comment on the driver board and records a verdict", async () => {
    const page = await reviewer.browser.newPage();
    await signInThroughForm(page, "reviewer@sinkwise.test");
    await page.getByTestId("unread-count").waitFor();
    // Side by side first: the build under review is offered as one the reviewer was asked to review.
    await page.goto(`${BASE_URL}/compare`);
    await page.getByLabel(`Compare ${titles.strapped}`, { exact: true }).locator("xpath=..").getByText("asked to review").waitFor();
    await page.goto(`${BASE_URL}/compare?items=${ids.strapped},${ids.pressed},${ids.floating}`);
    const lines = page.getByTestId("compare-summary-lines").locator("li");
    await lines.first().waitFor({ timeout: 60_000 });
    // Its first line says which driver cooling wins in each mode; the next lines say why, with numbers.
    await expect.poll(() => lines.first().textContent()).toMatch(/^Driver (strapped to the housing|pressed to the wall|floating free) wins in /);
    expect(await lines.nth(1).textContent()).toMatch(/(wins|tie|no variant wins).* K /);
    // Every figure of the summary table opens to its derivation, as on the Budget: formula, inputs, source.
    const cell = page.getByTestId("compare-summary-table").locator("td[data-winner]").first();
    await cell.locator("summary").first().click();
    await expect.poll(() => cell.textContent()).toMatch(/Source: /);
    const costRow = page.getByTestId("compare-summary-table").locator("tr").filter({ hasText: "parts cost" });
    await costRow.locator("summary").first().click();
    await expect.poll(() => costRow.textContent()).toContain("Parts cost: every priced part times its count");
    await shot(page, "reviewer-compare-summary");
    // A ladder's total opens to ambient plus its rungs.
    const totals = page.getByTestId("compare-place-ladders").getByRole("region", { name: "Ladder, driver board" }).getByTestId("ladder-totals").first();
    await totals.locator("summary").first().click();
    await expect.poll(() => totals.textContent()).toContain("ambient plus every rung of the ladder");
    // Pins where the reviewer reviews: on Side by side, click the driver board in the column under review.
    const reviewed = page.getByTestId("compare-heat-path").filter({ hasText: "you review this" }).first();
    await reviewed.locator('[data-pin-target="node:driver"]').click();
    const pinForm = page.getByRole("form", { name: "Pin a comment" });
    await expect.poll(() => pinForm.getByTestId("pin-target").textContent()).toMatch(/Pinned to: driver board, (\w+ mode|charging) — in your review of /);
    await pinForm.getByLabel("Comment").fill("Side by side: this column's driver board is the one to watch.");
    await pinForm.getByRole("button", { name: "Pin the comment" }).click();
    await reviewed.locator('[data-pin-target="node:driver"]').getByTestId("pin-mark").waitFor();
    await shot(page, "reviewer-compare-pinned");

    await page.goto(`${BASE_URL}/reviews`);
    await page.getByRole("button", { name: /^Notifications/ }).click();
    await page.getByRole("dialog", { name: "Notifications" }).waitFor();
    // The open request is listed first (the demo's finished review is under "Decided").
    await page.getByRole("region", { name: "Waiting for your verdict" }).getByRole("link", { name: titles.strapped, exact: true }).first().click();
    await page.waitForURL(/\/reviews\/[^/]+$/);
    // The notification list closed when the page changed.
    await expect.poll(() => page.getByRole("dialog", { name: "Notifications" }).count()).toBe(0);
    await page.getByTestId("heat-path-diagram").first().locator('[data-pin-target="node:driver"]').click();
    await expect.poll(() => page.getByTestId("pin-target").textContent()).toMatch(/Pinned to: driver board, \w+ mode/);
    await page.getByLabel("Comment", { exact: true }).fill("Strapped, the driver board keeps its headroom on high; floating free it does not.");
    await page.getByRole("button", { name: "Pin the comment" }).click();
    const pinned = page.getByTestId("review-comment").filter({ hasText: "keeps its headroom" });
    await pinned.waitFor();
    await expect.poll(() => pinned.textContent()).toMatch(/driver board, \w+ mode/);
    expect(await pinned.textContent()).not.toMatch(/#|mode:|->/);
    // The pin is drawn on the diagram.
    await page.getByTestId("heat-path-diagram").first().locator('[data-pin-target="node:driver"]').getByTestId("pin-mark").waitFor();
    await shot(page, "review-pinned-on-driver-board");
    // A point of the warm-up chart takes a pin too, named by place, time and scenario, and is drawn on the chart.
    const chart = page.getByTestId("warmup-chart").first();
    const box = (await chart.locator("canvas").boundingBox())!;
    await chart.locator("canvas").click({ position: { x: box.width * 0.6, y: box.height * 0.35 } });
    await expect.poll(() => page.getByTestId("pin-target").textContent()).toMatch(/Pinned to: warm-up of the [A-Za-z ]+ at \d+ (s|min|h)( \d+ min)?, (\w+ mode|charging)$/);
    await page.getByLabel("Comment", { exact: true }).fill("Look at how fast it climbs here.");
    await page.getByRole("button", { name: "Pin the comment" }).click();
    await page.getByTestId("review-comment").filter({ hasText: "how fast it climbs" }).waitFor();
    await expect.poll(() => page.getByTestId("chart-pins").textContent()).toMatch(/1 comment on the [A-Za-z ]+ at \d+/);
    await shot(page, "review-pinned-on-warmup-chart");
    const verdict = page.getByRole("form", { name: "Verdict" });
    await verdict.getByLabel("changes requested").check();
    // Before the button is pressed the form says the summary is still missing.
    await expect.poll(() => verdict.getByTestId("verdict-needs").textContent()).toContain("Summary");
    await verdict.getByLabel("Summary").fill("Keep the copper strap; time-limit high mode.");
    await verdict.getByRole("button", { name: "Record the verdict" }).click();
    await page.getByTestId("verdict").waitFor();
    await expect.poll(() => page.getByTestId("verdict").textContent()).toContain("Keep the copper strap");
    await shot(page, "review-verdict");

    // The review's own share link opens signed out: verdict and comments, nothing private.
    const panel = page.getByTestId("review-share").getByRole("region", { name: "Share links" });
    await panel.getByLabel("Expires after (days)").fill("3");
    await panel.getByRole("button", { name: "Create a link" }).click();
    const url = await panel.getByTestId("share-url").inputValue();
    expect(url).toMatch(/\/share\/review\/[A-Za-z0-9_-]{43}$/);
    const stranger = await launch();
    try {
      const anon = await stranger.browser.newPage();
      await anon.goto(url.replace(/^https?:\/\/[^/]+/, BASE_URL));
      await anon.getByTestId("shared-review").waitFor();
      await expect.poll(() => anon.getByTestId("shared-verdict").textContent()).toContain("Keep the copper strap");
      await expect.poll(() => anon.getByTestId("shared-comment").filter({ hasText: "keeps its headroom" }).textContent()).toMatch(/driver board, \w+ mode/);
      expect(await anon.locator("body").textContent()).not.toMatch(/@sinkwise\.test/);
      // The reviewed revision's heat path, with the pin on the driver board drawn on it.
      const shared = anon.getByTestId("shared-heat-path");
      await shared.getByTestId("heat-path-diagram").waitFor();
      await shared.getByRole("tab").filter({ hasText: "pinned" }).first().click();
      await shared.getByTestId("pin-mark").first().waitFor();
      await shot(anon, "review-share-link-signed-out");
    } finally {
      await stranger.close();
    }
    await page.close();
  });

  it("the maker sees the verdict on the build and in the notifications", async () => {
    const page = await maker.browser.newPage();
    await page.goto(`${BASE_URL}/builds/${ids.strapped}/reviews`);
    const review = page.getByTestId("build-review").first();
    await expect.poll(() => review.textContent()).toContain("changes requested");
    await expect.poll(() => review.textContent()).toContain("Keep the copper strap; time-limit high mode.");
    await page.getByTestId("unread-count").waitFor();
    await page.getByRole("button", { name: /^Notifications/ }).click();
    await page.getByRole("dialog", { name: "Notifications" }).getByText("changes requested").first().waitFor();
    await shot(page, "review-seen-by-maker");
    await page.close();
  });
});
