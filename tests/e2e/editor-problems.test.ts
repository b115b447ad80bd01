import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ARTEFACTS, launch, signInThroughForm } from "../support/browser";
import { BASE_URL, signedIn } from "../support/http";
import { createParts, type PartIds } from "../support/retrofit";

let session: Awaited<ReturnType<typeof launch>>;
let buildId = "";
const tag = Date.now().toString(36);

beforeAll(async () => {
  // Parts from the fixtures (generic, invented): the driver takes 2.8–4.2 V, the cell is a 3.6 V
  // li-ion; two in series make 7.2 V nominal, outside the driver's input range.
  const maker = await signedIn("maker@sinkwise.test");
  const ids = await createParts(maker, "private");
  const slot = (kind: keyof PartIds) => ({ partId: ids[kind] });
  const design = {
    housing: slot("housing"),
    lightEngine: { emitter: slot("emitter"), count: 1, interface: slot("interface"), heatsink: slot("heatsink") },
    driver: { part: slot("driver"), cooling: { kind: "floating" } },
    pack: { cell: slot("cell"), series: 2, parallel: 1 },
    environment: { ambientC: 25 },
  };
  const created = await maker.post("/api/v1/builds", { title: `Two cells on a one-cell driver ${tag}`, design });
  expect(created.status, JSON.stringify(created.body)).toBe(201);
  buildId = (created.body.build as { id: string }).id;
  session = await launch();
});
afterAll(async () => {
  await session?.close();
});

describe("the Heat path editor shows the evaluation's problems by their fields, in chromium", () => {
  it("names a pack voltage outside the driver's input range next to the Cell field", async () => {
    const page = await session.browser.newPage();
    await signInThroughForm(page, "maker@sinkwise.test");
    await page.goto(`${BASE_URL}/builds/${buildId}`);
    await page.getByTestId("heat-path-editor").waitFor();
    await page.getByTestId("editor-problems").waitFor({ timeout: 30_000 });
    // The field's <label> holds its select and the problems under it.
    const cellField = page.locator("label").filter({ has: page.getByRole("combobox", { name: "Cell", exact: true }) });
    const problem = cellField.getByTestId("field-problem").filter({ hasText: "outside the driver's input range" });
    await problem.waitFor();
    expect(await problem.textContent()).toMatch(/2S1P.*2\.8.*4\.2/);
    expect(await problem.getAttribute("data-severity")).toBe("error");
    expect(await problem.getAttribute("class")).toContain("text-over");
    expect(await page.getByTestId("heat-path-editor").textContent()).not.toContain("NaN");
    // Tall enough for the whole editor, so its sticky save bar rests below the fields, not over them.
    await page.setViewportSize({ width: 1280, height: 1800 });
    await page.screenshot({ path: `${ARTEFACTS}/editor-problems.png`, fullPage: true });
    await page.locator("fieldset", { has: cellField }).screenshot({ path: `${ARTEFACTS}/editor-problems-pack.png` });
  });

  it("checks the unsaved draft live, puts a bad value's message next to its field in plain words, and saves nothing", async () => {
    const maker = await signedIn("maker@sinkwise.test");
    const page = await session.browser.newPage();
    await signInThroughForm(page, "maker@sinkwise.test");
    await page.goto(`${BASE_URL}/builds/${buildId}`);
    await page.getByTestId("live-verdict").waitFor({ timeout: 30_000 });
    expect(await page.getByTestId("live-state").textContent()).toContain("as saved");
    // One cell instead of two: the pack now suits the driver; the draft is checked before saving.
    await page.getByRole("spinbutton", { name: "Cells in series", exact: true }).fill("1");
    await page.getByTestId("live-state").filter({ hasText: "Unsaved draft" }).waitFor({ timeout: 30_000 });
    const cellField = page.locator("label").filter({ has: page.getByRole("combobox", { name: "Cell", exact: true }) });
    await cellField.getByTestId("field-problem").filter({ hasText: "outside the driver's input range" }).waitFor({ state: "detached", timeout: 30_000 });
    // A fraction where a whole number belongs: the message sits under the field, named by its label.
    await page.getByRole("spinbutton", { name: "Chargers in parallel", exact: true }).fill("2.5");
    const chargers = page.locator("[data-field='pack.chargerCount']");
    await chargers.getByText("Chargers in parallel: must be a whole number").waitFor({ timeout: 30_000 });
    await page.evaluate(() => window.scrollTo(0, 0));
    await page.getByRole("button", { name: /Save as revision/ }).click();
    // The first field in error is scrolled into view, above the save bar.
    await page.waitForFunction(() => {
      const el = document.querySelector("[data-field-error='true']");
      const bar = document.querySelector("[data-testid='save-bar']");
      if (!el || !bar) return false;
      const r = el.getBoundingClientRect();
      return r.top >= 0 && r.bottom <= bar.getBoundingClientRect().top;
    }, undefined, { timeout: 10_000 });
    await page.screenshot({ path: `${ARTEFACTS}/editor-live-error.png` });
    const text = (await page.getByTestId("heat-path-editor").textContent()) ?? "";
    expect(text).not.toMatch(/NaN|design\.pack|Invalid input|expected int/);
    const after = await maker.get(`/api/v1/builds/${buildId}`);
    expect((after.body.build as { currentRevision: number }).currentRevision).toBe(1);
  });
});
