import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ARTEFACTS, launch, type Page, signInThroughForm } from "../support/browser";
import { BASE_URL, signedIn } from "../support/http";

// The demo evening course (scripts/seed/classroom.ts) in chromium: the instructor opens the
// class, a worked example and the roster and leaves feedback; a student answers a hidden
// value, forks an example into Side by side and reads the feedback on their hand-in.
let instructor: Awaited<ReturnType<typeof launch>>;
let student: Awaited<ReturnType<typeof launch>>;
let classId = "";
const CLASS = "Evening course: how heat leaves an LED retrofit";

async function shot(page: Page, name: string) {
  await page.screenshot({ path: `${ARTEFACTS}/${name}.png`, fullPage: true });
}

beforeAll(async () => {
  const api = await signedIn("instructor@sinkwise.test");
  const classes = (await api.get("/api/v1/classes")).body.classes as { id: string; name: string }[];
  classId = classes.find((c) => c.name === CLASS)?.id ?? "";
  expect(classId, "the demo class is seeded").not.toBe("");
  [instructor, student] = await Promise.all([launch(), launch()]);
}, 120_000);

afterAll(async () => {
  await instructor?.close();
  await student?.close();
});

describe("Classroom in chromium", () => {
  it("the instructor opens the class, a worked example with its derivation, the handout and the roster", async () => {
    const page = await instructor.browser.newPage();
    // Worked examples and the roster solve revisions on first view: slow on a busy machine.
    page.setDefaultTimeout(120_000);
    await signInThroughForm(page, "instructor@sinkwise.test");
    await page.goto(`${BASE_URL}/classes`);
    await page.getByRole("link", { name: CLASS }).click({ timeout: 60_000 });
    await page.waitForURL(`${BASE_URL}/classes/${classId}`);
    await expect.poll(() => page.getByTestId("join-code").textContent()).toMatch(/^[A-Z0-9]{8}$/);
    expect(await page.getByTestId("class-member").count()).toBe(3);
    await shot(page, "classroom-instructor-class");

    await page.getByRole("link", { name: "Why the lantern's junction runs hot" }).click();
    await page.getByRole("heading", { name: "Derivation" }).waitFor({ timeout: 120_000 });
    // The narrative's maths is typeset by KaTeX; the derivation's equations too.
    expect(await page.locator("section[aria-label=Narrative] .katex").count()).toBeGreaterThan(0);
    expect(await page.getByTestId("derivation-step").count()).toBeGreaterThan(5);
    const firstStep = page.getByTestId("derivation-step").first();
    expect(await firstStep.evaluate((d) => (d as HTMLDetailsElement).open)).toBe(false);
    await firstStep.locator("summary").click();
    expect(await firstStep.evaluate((d) => (d as HTMLDetailsElement).open)).toBe(true);
    await firstStep.locator(".katex").first().waitFor();
    expect(await firstStep.textContent()).toContain("Source:");
    expect(await page.locator("body").textContent()).not.toMatch(/NaN|−0(?![.\d])/);
    await shot(page, "classroom-instructor-example");

    // The printable handout fits two A4 pages.
    await page.getByRole("link", { name: "Printable handout" }).click();
    await page.getByRole("button", { name: "Print" }).waitFor({ timeout: 120_000 });
    await page.emulateMedia({ media: "print" });
    const pdf = await page.pdf({ format: "A4", printBackground: false, preferCSSPageSize: true });
    const pages = (pdf.toString("latin1").match(/\/Type\s*\/Page[^s]/g) ?? []).length;
    expect(pages).toBeGreaterThanOrEqual(1);
    expect(pages).toBeLessThanOrEqual(2);
    await page.emulateMedia({ media: "screen" });
    await shot(page, "classroom-handout");

    await page.goto(`${BASE_URL}/classes/${classId}`);
    await page.getByRole("link", { name: "Cool the lantern's driver" }).click();
    await page.getByTestId("roster").waitFor({ timeout: 120_000 });
    const rows = page.getByTestId("roster-row");
    expect(await rows.count()).toBe(2);
    const text = await page.getByTestId("roster").textContent();
    expect(text).toContain("late");
    expect(text).toContain("on time");
    // Sorting by junction puts the cooler hand-in first when ascending.
    await page.getByRole("button", { name: "Junction" }).click();
    expect(await rows.count()).toBe(2);
    await shot(page, "classroom-instructor-roster");
    const late = rows.filter({ hasText: "Jory" });
    await late.getByRole("button", { name: "Feedback" }).click();
    await page.getByLabel("Feedback", { exact: true }).fill("Floating free the driver runs hottest: try pressing it to the wall.");
    await page.getByRole("button", { name: "Send feedback" }).click();
    await page.getByRole("status").filter({ hasText: "notified in the app and by e-mail" }).waitFor({ timeout: 60_000 });

    // The build behind the example with questions: its share links stay closed until the reveal, and its Heat path says so.
    const builds = (await (await page.request.get(`${BASE_URL}/api/v1/builds`)).json()) as { mine: { id: string; title: string }[] };
    const inspection = builds.mine.find((b) => b.title === "Teaching copy: inspection lamp")!;
    await page.goto(`${BASE_URL}/builds/${inspection.id}`);
    const warning = page.getByTestId("share-warning");
    await warning.waitFor();
    expect(await warning.textContent()).toMatch(/^While the worked example “Your turn: the inspection lamp's driver” keeps values hidden from its class, links to this build do not open/);
    await page.getByTestId("build-reviews").screenshot({ path: `${ARTEFACTS}/classroom-instructor-share-warning.png` });
  }, 600_000);

  it("a student answers a hidden value, forks an example into Side by side and reads the feedback on their hand-in", async () => {
    const page = await student.browser.newPage();
    page.setDefaultTimeout(120_000);
    await signInThroughForm(page, "student1@sinkwise.test");
    await page.goto(`${BASE_URL}/classes/${classId}`);
    expect(await page.getByTestId("join-code").count()).toBe(0);
    await shot(page, "classroom-student-class");

    await page.getByRole("link", { name: "Your turn: the inspection lamp's driver" }).click();
    await page.getByRole("heading", { name: "Derivation" }).waitFor({ timeout: 120_000 });
    const box = page.getByRole("form", { name: /Your answer: temperature/ }).first();
    await box.getByRole("textbox").fill("1");
    await box.getByRole("button", { name: "Check" }).click();
    await expect.poll(() => box.getByRole("status").textContent(), { timeout: 60_000 }).toContain("Not within");
    await shot(page, "classroom-student-hidden-values");

    await page.goto(`${BASE_URL}/classes/${classId}`);
    await page.getByRole("link", { name: "Why the lantern's junction runs hot" }).click();
    await page.getByRole("button", { name: "Fork into my builds and compare" }).click();
    await page.waitForURL(/\/compare\?items=/, { timeout: 60_000 });
    await page.getByTestId("compare-figures").waitFor({ timeout: 60_000 });
    expect(await page.getByTestId("compare-column").count()).toBe(2);
    await shot(page, "classroom-student-fork-side-by-side");

    await page.goto(`${BASE_URL}/classes/${classId}`);
    await page.getByRole("link", { name: "Cool the lantern's driver" }).click();
    const fb = page.getByTestId("feedback");
    await fb.waitFor({ timeout: 120_000 });
    expect(await fb.textContent()).toContain("8/10");
    expect(await page.getByTestId("roster").count()).toBe(0);
    await shot(page, "classroom-student-handin-feedback");
  }, 600_000);

  it("renders Markdown with script, raw HTML and javascript: links inert", async () => {
    const api = await signedIn("instructor@sinkwise.test");
    const builds = (await api.get("/api/v1/builds")).body.mine as { id: string }[];
    const narrative = 'Hi <script>window.__pwned = 1</script> <img src=x onerror="window.__pwned = 2"> [click](javascript:window.__pwned=3) and $a^2$';
    const r = await api.post(`/api/v1/classes/${classId}/examples`, { title: `Inert ${Date.now()}`, narrative, buildId: builds[0]!.id });
    expect(r.status).toBe(201);
    const page = await instructor.browser.newPage();
    page.setDefaultTimeout(120_000);
    await page.goto(`${BASE_URL}/classes/${classId}/examples/${(r.body.example as { id: string }).id}`);
    await page.getByRole("heading", { name: "Derivation" }).waitFor({ timeout: 120_000 });
    const narr = page.locator("section[aria-label=Narrative]");
    expect(await narr.locator("script, img").count()).toBe(0);
    const hrefs = await narr.locator("a").evaluateAll((as) => as.map((a) => a.getAttribute("href") ?? ""));
    expect(hrefs.every((h) => !h.toLowerCase().startsWith("javascript:"))).toBe(true);
    expect(await page.evaluate(() => (window as unknown as { __pwned?: number }).__pwned)).toBeUndefined();
    expect(await narr.locator(".katex").count()).toBe(1);
  }, 300_000);
});
