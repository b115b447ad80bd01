import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ARTEFACTS, launch, signInThroughForm } from "../support/browser";
import { BASE_URL } from "../support/http";
import type { BuildEvaluation } from "@/lib/retrofit";

let session: Awaited<ReturnType<typeof launch>>;

beforeAll(async () => {
  session = await launch();
});
afterAll(async () => {
  await session?.close();
});

/** A logger's file: minutes and °F in the headers, a probe column, readings every minute of a sink near 5 K/W, 90 J/K at 7 W in 77 °F air. */
function loggerCsv(): string {
  const lines = ["Elapsed (min),Sink °F,Probe"];
  for (let min = 0; min <= 30; min++) {
    const c = 25 + 35 * (1 - Math.exp((-min * 60) / 450));
    lines.push(`${min},${((c * 9) / 5 + 32).toFixed(1)},heatsink`);
  }
  return lines.join("\n");
}

describe("Bench runs in chromium", () => {
  it("imports a logger CSV, fits, saves the run, keeps the part, uses it in a build and sees it measured on the Budget", async () => {
    const page = await session.browser.newPage();
    await signInThroughForm(page, "maker@sinkwise.test");
    await page.goto(`${BASE_URL}/bench`);
    await page.getByRole("heading", { name: "Bench runs" }).waitFor();
    const title = `Logger run ${Date.now().toString(36)}`;
    await page.getByLabel("Title").fill(title);
    await page.getByLabel("Heat into the sink").fill("7 W");
    await page.getByLabel("Ambient").fill("25 °C");
    await page.getByLabel("Logger CSV").setInputFiles({ name: "logger.csv", mimeType: "text/csv", buffer: Buffer.from(loggerCsv()) });
    await page.getByTestId("csv-preview").waitFor();
    await expect.poll(() => page.getByTestId("csv-preview").textContent()).toContain("31 readings");
    await expect.poll(() => page.getByLabel("Temperature unit").inputValue()).toBe("F");
    await expect.poll(() => page.getByLabel("Time unit").inputValue()).toBe("min");
    await page.screenshot({ path: `${ARTEFACTS}/bench-csv-preview.png`, fullPage: true });

    await page.getByRole("button", { name: "Fit", exact: true }).click();
    await page.getByTestId("fit-summary").waitFor();
    const r = await page.getByTestId("fit-r").textContent();
    const kPerW = Number(/^([\d.]+) K\/W/.exec(r ?? "")?.[1]);
    // The file follows a 5 K/W first-order warm-up; the natural-convection model fits it within a few per cent.
    expect(kPerW).toBeGreaterThan(4.6);
    expect(kPerW).toBeLessThan(5.4);
    await page.screenshot({ path: `${ARTEFACTS}/bench-fit.png`, fullPage: true });

    await page.getByRole("button", { name: "Save run" }).click();
    await page.waitForURL(/\/bench\/[A-Za-z0-9_-]{10,}$/);
    await page.getByRole("heading", { name: title }).waitFor();
    await page.getByLabel("Part name").fill(`${title} sink`);
    await page.getByRole("button", { name: "Keep as a heatsink part" }).click();
    await page.getByTestId("kept-part").waitFor();
    const partHref = await page.getByTestId("kept-part").getByRole("link").getAttribute("href");
    const partId = partHref?.split("/").pop() ?? "";
    expect(partId).not.toBe("");
    await page.screenshot({ path: `${ARTEFACTS}/bench-run-kept.png`, fullPage: true });

    // Use it in a build: a copy of the demo lantern's design with this sink.
    const list = (await (await page.request.get(`${BASE_URL}/api/v1/builds`)).json()) as { mine: { id: string; title: string }[] };
    const source = list.mine.find((b) => b.title === "Square lantern, 2-cell Li-ion")!;
    const detail = (await (await page.request.get(`${BASE_URL}/api/v1/builds/${source.id}`)).json()) as { revision: { design: { lightEngine: { heatsink: { partId: string } }; calibration?: unknown } } };
    const design = structuredClone(detail.revision.design);
    design.lightEngine.heatsink = { partId };
    // The demo lantern's current revision is calibrated to its own warm-up; this build starts from the model as it stands.
    delete design.calibration;
    const created = await page.request.post(`${BASE_URL}/api/v1/builds`, { data: { title: `${title} lantern`, design }, headers: { origin: BASE_URL } });
    expect(created.status()).toBe(201);
    const buildId = ((await created.json()) as { build: { id: string } }).build.id;

    await page.goto(`${BASE_URL}/builds/${buildId}/budget`);
    await page.getByTestId("measured-sink").waitFor();
    await expect.poll(() => page.getByTestId("measured-sink").textContent()).toMatch(/measured on the bench/);
    await page.screenshot({ path: `${ARTEFACTS}/bench-budget-measured.png`, fullPage: true });

    // A warm-up of the finished build, read at the sink and the wall: the Budget overlays it on the prediction.
    // The "lamp" is the model's own warm-up of its highest mode running 10 % cooler in its rise
    // (readings rounded to 0.1 °C, as a thermocouple meter shows them).
    const solved = (await (await page.request.post(`${BASE_URL}/api/v1/builds/${buildId}/solve`, { data: {}, headers: { origin: BASE_URL } })).json()) as { evaluation: BuildEvaluation };
    const mode = solved.evaluation.scenarios.filter((s) => s.kind === "mode" && s.warmup).at(-1)!;
    const ambientC = solved.evaluation.scenarios[0]?.network?.ambientC ?? 20;
    const warmup = ["heatsink", "housing wall"].flatMap((place) => {
      const node = mode.thermal!.nodes.find((n) => n.place === place)!;
      return [2, 6, 10, 15, 20, 30, 40].map((min) => {
        const i = mode.warmup!.timesS.findIndex((t) => t >= min * 60);
        return { tS: mode.warmup!.timesS[i]!, tempC: Math.round((ambientC + 0.9 * (mode.warmup!.temperaturesC[node.id]![i]! - ambientC)) * 10) / 10, place };
      });
    });
    const held = await page.request.post(`${BASE_URL}/api/v1/bench/runs`, {
      data: { title: `${title} lantern warm-up`, powered: { kind: "build", buildId, mode: mode.name }, conditions: { ambientC, volts: "7.4 V", amps: "0.9 A" }, readings: warmup },
      headers: { origin: BASE_URL },
    });
    expect(held.status()).toBe(201);
    await page.reload();
    await page.getByTestId("bench-overlay").waitFor();
    await expect.poll(() => page.getByTestId("hold-verdict").textContent()).toMatch(/^The model (ran (hotter|colder) than the lamp by \d+\.\d K at the|and the lamp agree)/);
    await page.getByTestId("overlay-chart").waitFor();
    await page.getByTestId("bench-overlay").screenshot({ path: `${ARTEFACTS}/bench-budget-overlay.png` });

    // Calibrate: the sink is measured, so the least certain figure is the inside air's; the lamp ran cooler, so more heat goes through it.
    await page.getByRole("button", { name: "Calibrate the model to this run" }).click();
    await page.getByTestId("calibration-result").waitFor({ timeout: 60_000 });
    const factorText = (await page.getByTestId("calibration-factor").textContent()) ?? "";
    expect(factorText).toMatch(/× \d\.\d\d \(95 % interval \d\.\d\d–\d\.\d\d\); the misfit falls from \d+\.\d K to \d+\.\d K\./);
    expect(await page.getByTestId("calibration-result").textContent()).toMatch(/Least certain figure: the inside air's coefficient\./);
    expect(Number(/× (\d\.\d\d)/.exec(factorText)?.[1])).toBeGreaterThan(1);
    await page.getByTestId("bench-overlay").screenshot({ path: `${ARTEFACTS}/bench-calibration.png` });
    await page.getByRole("button", { name: "Save as revision 2" }).click();
    await page.getByTestId("calibration-saved").waitFor();
    await page.getByTestId("calibration-note").waitFor();
    await expect.poll(() => page.getByText("Budget · revision 2").count()).toBe(1);
    await page.screenshot({ path: `${ARTEFACTS}/bench-budget-calibrated.png`, fullPage: true });

    // The Heat path shows the calibration the revision carries; the maker takes it out and saves.
    await page.goto(`${BASE_URL}/builds/${buildId}`);
    const section = page.getByTestId("calibration-section");
    await section.waitFor();
    expect(await section.textContent()).toMatch(/The inside air's coefficient \(convection to and from the air inside the housing\) is the model's × \d\.\d\d \(95 % interval \d\.\d\d–\d\.\d\d\), fitted to the warm-up/);
    await section.screenshot({ path: `${ARTEFACTS}/bench-heat-path-calibration.png` });
    await section.getByRole("button", { name: "Remove the calibration" }).click();
    await page.getByTestId("calibration-removed").waitFor();
    await page.getByRole("button", { name: "Save as revision 3" }).click();
    await page.getByRole("status").filter({ hasText: "Saved as revision 3." }).waitFor({ timeout: 60_000 });
    await expect.poll(() => section.count()).toBe(0);
    await page.goto(`${BASE_URL}/builds/${buildId}/budget`);
    await page.getByText("Budget · revision 3").waitFor();
    expect(await page.getByTestId("calibration-note").count()).toBe(0);
  });
});
