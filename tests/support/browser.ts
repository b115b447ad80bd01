// Launches Debian's chromium through playwright-core for the end-to-end tests.
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { type Browser, type BrowserContext, chromium, type Page } from "playwright-core";
import { BASE_URL, DEMO_PASSWORD } from "./http";

export const ARTEFACTS = "test-results";

export async function launch(): Promise<{ browser: BrowserContext; close: () => Promise<void> }> {
  const userDataDir = mkdtempSync(join(tmpdir(), "sinkwise-chromium-"));
  const context = await chromium.launchPersistentContext(userDataDir, {
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    headless: true,
    viewport: { width: 1280, height: 860 },
    args: [
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
      "--host-resolver-rules=MAP * ~NOTFOUND, EXCLUDE localhost, EXCLUDE 127.0.0.1",
    ],
  });
  // Every page is watched for scripts or styles the Content-Security-Policy blocked: a test
  // whose pages broke the policy fails when its browser closes, naming what was blocked.
  const blocked: string[] = [];
  const watch = (page: Page) =>
    page.on("console", (message) => {
      if (/Content Security Policy/i.test(message.text())) blocked.push(`${page.url()}: ${message.text().slice(0, 300)}`);
    });
  context.pages().forEach(watch);
  context.on("page", watch);
  return {
    browser: context,
    close: async () => {
      await context.close();
      if (blocked.length) throw new Error(`The page's Content-Security-Policy blocked something:\n${blocked.slice(0, 5).join("\n")}`);
    },
  };
}

export async function signInThroughForm(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto(`${BASE_URL}/signin`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(`${BASE_URL}/builds`);
}

export type { Browser, Page };
