import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ARTEFACTS, launch, signInThroughForm } from "../support/browser";
import { BASE_URL, Client, uniqueEmail } from "../support/http";

let session: Awaited<ReturnType<typeof launch>>;

beforeAll(async () => {
  session = await launch();
});
afterAll(async () => {
  await session?.close();
});

describe("the app shell in chromium", () => {
  it("signs in the demo maker through the form and shows the maker's navigation", async () => {
    const page = await session.browser.newPage();
    await signInThroughForm(page, "maker@sinkwise.test");
    const nav = page.getByRole("navigation", { name: "Main" });
    for (const label of ["Quick check", "Parts bin", "Builds", "Side by side", "Classroom"]) {
      await nav.getByRole("link", { name: label }).waitFor();
    }
    expect(await nav.getByRole("link", { name: "Admin" }).count()).toBe(0);
    await expect.poll(() => page.getByTestId("signed-in-user").textContent()).toContain("Mara Quayle");
    await expect.poll(() => page.getByTestId("signed-in-user").textContent()).toContain("Maker");
    await page.screenshot({ path: `${ARTEFACTS}/shell-maker.png`, fullPage: true });
    // Every screen in the navigation answers (no 404 from the nav).
    for (const href of ["/check", "/parts", "/builds", "/compare", "/classes"]) {
      const r = await page.goto(`${BASE_URL}${href}`);
      expect(r?.status(), href).toBe(200);
    }
    await page.getByRole("button", { name: "Sign out" }).click();
    await page.waitForURL(`${BASE_URL}/`);
    await page.getByRole("link", { name: "Sign in" }).first().waitFor();
    await page.close();
  });

  it("lets the admin change a user's role on the admin page", async () => {
    const email = uniqueEmail("e2e-role");
    await new Client().post("/api/v1/auth/signup", { email, password: "long enough pw", displayName: "Role Candidate" });
    const page = await session.browser.newPage();
    await signInThroughForm(page, "admin@sinkwise.test");
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Admin" }).click();
    await page.waitForURL(`${BASE_URL}/admin`);
    const select = page.getByLabel(`Role of ${email}`);
    await expect.poll(() => select.inputValue()).toBe("maker");
    await select.selectOption("instructor");
    await expect.poll(() => page.getByRole("status").textContent()).toContain(`${email} is now Instructor`);
    await page.reload();
    await expect.poll(() => page.getByLabel(`Role of ${email}`).inputValue()).toBe("instructor");
    await page.screenshot({ path: `${ARTEFACTS}/shell-admin-roles.png`, fullPage: true });
    await page.close();
  });

  it("shows the field's message on the sign-up form", async () => {
    const page = await session.browser.newPage();
    await page.goto(`${BASE_URL}/signup`);
    await page.getByLabel("Name").fill("Short Pw");
    await page.getByLabel("E-mail").fill(uniqueEmail("form"));
    await page.getByLabel(/Password/).fill("short");
    await page.getByRole("button", { name: "Create account" }).click();
    await expect.poll(() => page.locator("form [role=alert]").textContent()).toContain("at least 10 characters");
    await page.close();
  });
});
