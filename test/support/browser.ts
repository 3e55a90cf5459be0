import path from "node:path";
import { chromium, type Browser } from "playwright-core";

/** Debian's Chromium; playwright-core never downloads a browser of its own. */
export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";

/**
 * Headless Chromium with every background connection off: this machine has no network,
 * and the tests must not try to reach one. Playwright gives each launch a fresh
 * temporary profile of its own (it refuses `--user-data-dir` in `launch`).
 */
export async function launchChromium(): Promise<{ browser: Browser; close: () => Promise<void> }> {
  const browser = await chromium.launch({
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: [
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
  });
  return { browser, close: () => browser.close() };
}

/** Where browser tests leave their screenshots (git-ignored). */
export const screenshotDir = path.resolve("test-results", "screenshots");
