import path from "node:path";
import { randomUUID } from "node:crypto";
import { chromium, type Browser, type BrowserContext } from "playwright-core";

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

/** A person who signs up through {@link signUpInContext}. */
export type BrowserAccount = { name: string; email: string; password: string };

/**
 * Signs a new account up through the API from inside `context`, so the context holds the
 * session cookie (Playwright's request context shares the browser context's cookies).
 * The Origin header is the app's own, as the CSRF check requires.
 */
export async function signUpInContext(
  context: BrowserContext,
  origin: string,
  name = "Teo Valdric",
): Promise<BrowserAccount> {
  const account = {
    name,
    email: `${name.split(" ")[0].toLowerCase()}-${randomUUID().slice(0, 8)}@example.test`,
    password: "rotated element 30",
  };
  const response = await context.request.post(`${origin}/api/auth/sign-up`, {
    data: account,
    headers: { Origin: origin },
  });
  if (response.status() !== 201)
    throw new Error(`sign-up failed: ${response.status()} ${await response.text()}`);
  return account;
}
