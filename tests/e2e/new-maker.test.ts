import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ARTEFACTS, launch, type Page } from "../support/browser";
import { BASE_URL, uniqueEmail } from "../support/http";

// The new maker's first Budget: sign up, start a torch from a starting point, swap in a
// typed-in salvaged finned sink (by its geometry) and a linear driver given by what it
// draws from the battery (a linear driver draws its LED current from the cell), watch the
// live check follow before saving, save, open the Budget. Every input the person changes
// is counted.
let session: Awaited<ReturnType<typeof launch>>;
beforeAll(async () => {
  session = await launch();
});
afterAll(async () => {
  await session?.close();
});

describe("a new maker's first Budget from a starting point, in chromium", () => {
  it("signs up, starts a torch, types in a sink and a driver, sees the live check change, saves and reads the Budget in at most 30 inputs", async () => {
    const page: Page = await session.browser.newPage();
    await page.setViewportSize({ width: 1280, height: 1000 });
    let inputs = 0;
    const fill = async (label: string, value: string) => {
      await page.getByLabel(label, { exact: true }).fill(value);
      inputs++;
    };
    const choose = async (label: string, value: string) => {
      await page.getByLabel(label, { exact: true }).selectOption(value);
      inputs++;
    };
    const click = async (target: ReturnType<Page["getByRole"]>) => {
      await target.click();
      inputs++;
    };

    await page.goto(`${BASE_URL}/signup`);
    await fill("Name", "New Maker");
    await fill("E-mail", uniqueEmail("new-maker"));
    await fill("Password (at least 10 characters)", "a long enough passphrase");
    await click(page.getByRole("button", { name: "Create account" }));
    await page.waitForURL(`${BASE_URL}/builds`);

    await click(page.getByRole("button", { name: "New build" }));
    await page.getByRole("radio", { name: /Torch/ }).waitFor();
    expect(await page.getByRole("radio", { name: /Torch/ }).isChecked()).toBe(true);
    await click(page.getByRole("button", { name: "Create" }));
    await page.getByTestId("heat-path-editor").waitFor();
    const verdict = page.getByTestId("live-verdict");
    await verdict.waitFor({ timeout: 60_000 });
    const modes = page.getByTestId("live-modes");
    await modes.waitFor({ timeout: 60_000 });
    const before = (await modes.textContent()) ?? "";
    const verdictBefore = (await verdict.textContent())?.trim();
    expect(["within budget", "tight", "over budget"]).toContain(verdictBefore);
    await page.screenshot({ path: `${ARTEFACTS}/new-maker-torch.png`, fullPage: true });

    // The salvaged finned sink, typed in by its geometry.
    await choose("Heatsink", "__new");
    await fill("Heatsink name", "Finned sink from an old amplifier");
    await choose("Heatsink: Described by", "geometry");
    await fill("Heatsink: Base length", "80 mm");
    await fill("Heatsink: Base width", "60 mm");
    await fill("Heatsink: Base thickness", "5 mm");
    await fill("Heatsink: Fin count", "12");
    await fill("Heatsink: Fin height", "25 mm");
    await fill("Heatsink: Fin thickness", "1.5 mm");
    // The gap between fins is left empty: it is worked out from the width, count and thickness.
    await choose("Heatsink: Material", "aluminium-6063-t5");

    // A linear driver: on high it draws 2.8 A from the cell, which is what it drives into the LED.
    await choose("Driver", "__new");
    await fill("Driver name", "Linear driver, draws 2.8 A from the cell on high");
    await choose("Driver: Topology", "linear");
    await fill("Driver: Input voltage, min", "3.0 V");
    await fill("Driver: Input voltage, max", "4.2 V");
    await click(page.getByRole("button", { name: "Add a mode" }));
    await fill("Mode 1 name", "high");
    await fill("Mode 1 output current", "2.8 A");
    await fill("Mode 1 efficiency", "80 %");

    // The live check follows the unsaved draft before anything is saved.
    await page.getByTestId("live-state").filter({ hasText: "Unsaved draft" }).waitFor({ timeout: 30_000 });
    await expect.poll(async () => (await modes.textContent()) ?? "", { timeout: 30_000 }).not.toBe(before);
    await expect.poll(async () => (await modes.textContent()) ?? "", { timeout: 30_000 }).toContain("Mode “high”");
    // The torch starts tight; a linear driver pushing 2.8 A into its 3 W emitter puts it over budget.
    expect(verdictBefore).toBe("tight");
    await expect.poll(async () => (await verdict.textContent())?.trim(), { timeout: 30_000 }).toBe("over budget");
    const verdictAfter = (await verdict.textContent())?.trim();
    // The save bar keeps the draft's verdict in sight wherever the maker has scrolled to.
    await expect.poll(async () => (await page.getByTestId("bar-verdict").textContent()) ?? "").toMatch(/^Draft:over budget/);
    const text = (await page.getByTestId("heat-path-editor").textContent()) ?? "";
    expect(text).not.toMatch(/NaN|Invalid input|expected int/);
    await page.screenshot({ path: `${ARTEFACTS}/new-maker-live.png`, fullPage: true });

    await click(page.getByRole("button", { name: /Save as revision 2/ }));
    await expect.poll(() => page.getByRole("status").filter({ hasText: "Saved as revision" }).count(), { timeout: 30_000 }).toBe(1);
    await click(page.getByRole("link", { name: "Budget", exact: true }));
    const overall = page.getByTestId("overall-verdict");
    await overall.waitFor({ timeout: 60_000 });
    expect(["within budget", "tight", "over budget"]).toContain((await overall.textContent())?.trim());
    await page.screenshot({ path: `${ARTEFACTS}/new-maker-budget.png`, fullPage: true });
    console.log(`[new maker] torch verdict ${verdictBefore} → ${verdictAfter} live, before saving; ${inputs} inputs from sign-up to the Budget`);
    expect(inputs).toBeLessThanOrEqual(30);
    await page.close();
  });
});
