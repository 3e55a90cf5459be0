import path from "node:path";
import { randomUUID } from "node:crypto";
import { chromium, type APIRequestContext, type Browser, type BrowserContext } from "playwright-core";

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
  if (response.status() !== 202)
    throw new Error(`sign-up failed: ${response.status()} ${await response.text()}`);
  await confirmInContext(context, origin, account.email);
  return account;
}

/**
 * The newest confirmation link mailed to `email`, read from the fake mailbox through the
 * API as the mailbox page does (sign-up mails it after answering, hence the polling).
 */
export async function confirmationLink(
  request: APIRequestContext,
  origin: string,
  email: string,
): Promise<string> {
  const deadline = Date.now() + 5_000;
  for (;;) {
    const list = await request.get(`${origin}/api/dev/mailbox?to=${encodeURIComponent(email)}`);
    const { messages } = (await list.json()) as { messages: { id: string; subject: string }[] };
    const found = messages.find((m) => /confirm your e-mail address/.test(m.subject));
    if (found) {
      const message = (await (await request.get(`${origin}/api/dev/mailbox/${found.id}`)).json()) as {
        text: string;
      };
      return message.text.match(/https?:\/\/\S+\/verify-email\/\S+/)![0];
    }
    if (Date.now() > deadline) throw new Error(`no confirmation mail to ${email}`);
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
}

/** Confirms `email` through the API from inside `context`, which then holds the session cookie. */
export async function confirmInContext(context: BrowserContext, origin: string, email: string) {
  const link = await confirmationLink(context.request, origin, email);
  const response = await context.request.post(`${origin}/api/auth/verify-email`, {
    data: { token: link.split("/").pop() },
    headers: { Origin: origin },
  });
  if (response.status() !== 200)
    throw new Error(`confirmation failed: ${response.status()} ${await response.text()}`);
}
