import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";

const ARGS = [
  "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking",
  "--disable-component-update", "--disable-sync", "--disable-dev-shm-usage",
];

/** Launches Debian's Chromium headless (never a downloaded browser). */
export function launchBrowser(): Promise<Browser> {
  return chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium", headless: true, args: ARGS });
}

/** A fresh context and page that fail the test on page errors. */
export async function newPage(browser: Browser, viewport = { width: 1280, height: 800 }): Promise<{ context: BrowserContext; page: Page; errors: string[] }> {
  const context = await browser.newContext({ viewport });
  const page = await context.newPage();
  const errors: string[] = [];
  page.on("pageerror", (error) => errors.push(error.message));
  page.on("console", (message) => {
    // A signed-out page asks the API who is signed in and gets a 401: expected, not a fault.
    if (message.type() === "error" && !/status of 401/.test(message.text())) errors.push(message.text());
  });
  return { context, page, errors };
}
