import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ARTEFACTS, launch, signInThroughForm } from "../support/browser";
import { BASE_URL, Client, uniqueEmail } from "../support/http";
import { signUp, waitForMail } from "../support/mail";

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
    await signUp(new Client(), { email, password: "long enough pw", displayName: "Role Candidate" });
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

  it("signs up through the mailed link: the form says to check the mail, the link's button makes the account", async () => {
    const page = await session.browser.newPage();
    const email = uniqueEmail("form-link");
    await page.goto(`${BASE_URL}/signup`);
    await page.getByLabel("Name").fill("Link Maker");
    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel(/Password/).fill("long enough pw");
    await page.getByRole("button", { name: "Create account" }).click();
    await expect.poll(() => page.getByRole("status").textContent()).toContain(`Check the mail of ${email}`);
    const mail = await waitForMail(email, "Finish making your Sinkwise account");
    const link = /http\S+\/signup\/finish\/[A-Za-z0-9_-]+/.exec(mail.text ?? "")?.[0];
    expect(link).toBeTruthy();
    await page.goto(link!);
    await page.getByRole("button", { name: "Make my account" }).click();
    await page.waitForURL(/\/builds/);
    await page.screenshot({ path: `${ARTEFACTS}/shell-signup-finished.png`, fullPage: true });
    await page.close();
  });
});
