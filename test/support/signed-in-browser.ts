import { mkdir } from "node:fs/promises";
import type { Browser, BrowserContext } from "playwright-core";
import { afterAll, beforeAll } from "vitest";
import type { RunningServer } from "../../api/server";
import { launchChromium, screenshotDir, signUpInContext } from "./browser";
import { startTestServer } from "./server";

/** What `signedInBrowser` sets up; read it inside tests (it is filled in by beforeAll). */
export type SignedInBrowser = { server: RunningServer; browser: Browser; editor: BrowserContext };

/**
 * Registers the usual browser-test world for the enclosing describe: a test server, Chromium and
 * one account signed up and confirmed in its own context (`editor`), all closed afterwards.
 */
export function signedInBrowser(name: string, viewport = { width: 1360, height: 900 }): SignedInBrowser {
  const world = {} as SignedInBrowser;
  let closeBrowser: (() => Promise<void>) | undefined;
  beforeAll(async () => {
    world.server = await startTestServer();
    ({ browser: world.browser, close: closeBrowser } = await launchChromium());
    await mkdir(screenshotDir, { recursive: true });
    world.editor = await world.browser.newContext({ viewport });
    // Signed up and confirmed through the mailed link (sign-up itself signs no one in).
    await signUpInContext(world.editor, world.server.url, name);
  });
  afterAll(async () => {
    await closeBrowser?.();
    await world.server?.close();
  });
  return world;
}
