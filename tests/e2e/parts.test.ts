import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ARTEFACTS, launch, signInThroughForm } from "../support/browser";
import { BASE_URL } from "../support/http";
import { minimalPdf } from "../support/pdf";

let session: Awaited<ReturnType<typeof launch>>;

beforeAll(async () => {
  session = await launch();
});
afterAll(async () => {
  await session?.close();
});


describe("Parts bin in chromium", () => {
  it("creates a heatsink with a value in inches, attaches a datasheet and finds it through the table's filter", async () => {
    const name = `Salvaged projector sink ${Date.now().toString(36)}`;
    const page = await session.browser.newPage();
    await signInThroughForm(page, "maker@sinkwise.test");
    await page.goto(`${BASE_URL}/parts/new?kind=heatsink`);
    await page.getByLabel("Name").fill(name);
    await page.getByLabel("Provenance").selectOption("measured");
    await page.getByLabel("Described by").selectOption("geometry");
    await page.getByLabel("Base length").waitFor();

    // A power in a length field is refused inline, next to the field.
    await page.getByLabel("Base length").fill("3 W");
    await page.getByRole("button", { name: "Create part" }).click();
    await expect.poll(() => page.locator("#specs-baseLengthM-error").textContent()).toContain("expected a length");
    await page.screenshot({ path: `${ARTEFACTS}/parts-form-error.png`, fullPage: true });

    await page.getByLabel("Base length").fill("0.8 in");
    await page.getByLabel("Base width").fill("40 mm");
    await page.getByLabel("Base thickness").fill("3 mm");
    await page.getByLabel("Fin count").fill("6");
    await page.getByLabel("Fin height").fill("15 mm");
    await page.getByLabel("Fin thickness").fill("1.5 mm");
    await page.getByLabel("Fin spacing").fill("6 mm");
    await page.getByLabel("Material").selectOption("aluminium-6063-t5");
    await page.getByLabel("Mass").fill("45 g");
    await page.getByRole("button", { name: "Create part" }).click();
    await page.waitForURL(/\/parts\/[A-Za-z0-9_-]{10,}$/);
    await page.getByRole("heading", { name }).waitFor();
    // 0.8 in = 20.32 mm exactly (1 in = 25.4 mm by definition).
    await expect.poll(() => page.locator('[data-field="baseLengthM"]').textContent()).toBe("20.32 mm");

    await page.getByLabel("Datasheet or photo").setInputFiles({ name: "projector-sink datasheet.pdf", mimeType: "application/pdf", buffer: Buffer.from(minimalPdf()) });
    await page.getByRole("button", { name: "Upload" }).click();
    await expect.poll(() => page.getByRole("status").textContent()).toContain("Attached projector-sink datasheet.pdf");
    await page.getByRole("link", { name: "projector-sink datasheet.pdf" }).waitFor();
    await page.screenshot({ path: `${ARTEFACTS}/parts-page.png`, fullPage: true });

    await page.goto(`${BASE_URL}/parts`);
    await page.getByLabel("Kind").selectOption("heatsink");
    await page.getByLabel("Search").fill(name);
    const table = page.getByRole("table", { name: "Parts" });
    await table.getByRole("link", { name }).waitFor();
    await expect.poll(() => table.getByRole("columnheader").allTextContents()).toEqual(expect.arrayContaining([expect.stringContaining("Fin count")]));
    await expect.poll(() => table.getByRole("row").count()).toBe(2);
    await page.getByLabel("Provenance").selectOption("datasheet");
    await expect.poll(() => table.getByRole("link", { name }).count()).toBe(0);
    await page.getByLabel("Provenance").selectOption("measured");
    await table.getByRole("link", { name }).waitFor();
    await page.screenshot({ path: `${ARTEFACTS}/parts-bin-filtered.png`, fullPage: true });
    await page.close();
  });

  it("previews a CSV import with a rejected row and says why", async () => {
    const page = await session.browser.newPage();
    await signInThroughForm(page, "maker@sinkwise.test");
    await page.goto(`${BASE_URL}/parts/import`);
    await page.getByLabel("Kind of part").selectOption("spreader");
    const tag = Date.now().toString(36);
    const csv = [
      "name,provenance,material,thicknessM [mm],widthM [mm],lengthM [mm]",
      `Preview strap ${tag},estimate,copper-pure,0.07,25,60`,
      `Bad strap ${tag},estimate,copper-pure,3 W,25,60`,
    ].join("\n");
    await page.getByLabel("CSV text").fill(csv);
    await page.getByRole("button", { name: "Preview" }).click();
    const preview = page.getByRole("table", { name: "Import preview" });
    await preview.waitFor();
    await expect.poll(() => preview.getByRole("row").nth(2).textContent()).toContain("expected a length");
    await expect.poll(() => page.getByRole("button", { name: /^Import/ }).isDisabled()).toBe(true);
    await page.screenshot({ path: `${ARTEFACTS}/parts-import-preview.png`, fullPage: true });
    await page.close();
  });
});
