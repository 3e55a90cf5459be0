import { readdir, readFile } from "node:fs/promises";
import path from "node:path";
import request from "supertest";
import { afterAll, describe, expect, it } from "vitest";
import { webDist } from "../../scripts/web-build";
import { buildTestApp } from "../support/app";

// Item 10 of issue 10: security headers on every response. The policy itself is checked
// against the built app below (no inline script or style to allow) and in Chromium by
// test/browser/content-security-policy.test.ts.
const { app, close } = buildTestApp();
const production = buildTestApp({ nodeEnv: "production" });
afterAll(async () => {
  await close();
  await production.close();
});

/** The directives of a Content-Security-Policy header, by name. */
function directives(header: string | undefined): Map<string, string[]> {
  return new Map(
    (header ?? "")
      .split(";")
      .map((d) => d.trim().split(/\s+/))
      .filter((parts) => parts[0])
      .map(([name, ...values]) => [name, values]),
  );
}

async function someAsset(): Promise<string> {
  const files = await readdir(path.join(webDist, "assets"));
  return `/assets/${files.find((f) => f.endsWith(".js"))}`;
}

describe("security headers", () => {
  const responses = async () => ({
    "the app's page": await request(app).get("/workspaces"),
    "a hashed asset": await request(app).get(await someAsset()),
    "an API answer": await request(app).get("/api/health"),
    "an API error": await request(app).get("/api/no-such-route"),
    "a malformed path": await request(app).get("/%FF"),
  });

  it("when anything is requested, then CSP, nosniff, no-referrer and frame denial come back", async () => {
    for (const [what, response] of Object.entries(await responses())) {
      const csp = directives(response.headers["content-security-policy"]);
      expect(csp.get("default-src"), what).toEqual(["'self'"]);
      expect(csp.get("script-src"), what).toEqual(["'self'"]);
      expect(csp.get("style-src"), what).toEqual(["'self'"]);
      expect(csp.get("font-src"), what).toEqual(["'self'"]);
      expect(csp.get("worker-src"), what).toEqual(["'self'", "blob:"]);
      expect(csp.get("object-src"), what).toEqual(["'none'"]);
      expect(csp.get("frame-ancestors"), what).toEqual(["'none'"]);
      expect(response.headers["x-content-type-options"], what).toBe("nosniff");
      expect(response.headers["referrer-policy"], what).toBe("no-referrer");
      expect(response.headers["x-frame-options"], what).toBe("DENY");
    }
  });

  it("when the server does not run in production, then no HSTS and no upgrade of http requests", async () => {
    for (const [what, response] of Object.entries(await responses())) {
      expect(response.headers["strict-transport-security"], what).toBeUndefined();
      expect(
        directives(response.headers["content-security-policy"]).has("upgrade-insecure-requests"),
        what,
      ).toBe(false);
    }
  });

  it("when the server runs in production, then HSTS asks for at least a year, subdomains included", async () => {
    for (const url of ["/api/health", "/workspaces"]) {
      const response = await request(production.app).get(url);
      const hsts = response.headers["strict-transport-security"] as string;
      expect(Number(/max-age=(\d+)/.exec(hsts)?.[1])).toBeGreaterThanOrEqual(365 * 24 * 3600);
      expect(hsts).toContain("includeSubDomains");
      expect(directives(response.headers["content-security-policy"]).has("upgrade-insecure-requests")).toBe(
        true,
      );
    }
  });
});

describe("the built app against the policy", () => {
  it("when dist/web/index.html is read, then every script has a src and no inline style or handler is used", async () => {
    const html = await readFile(path.join(webDist, "index.html"), "utf8");
    const scripts = [...html.matchAll(/<script\b([^>]*)>([\s\S]*?)<\/script>/gi)];
    expect(scripts.length).toBeGreaterThan(0);
    for (const [, attributes, body] of scripts) {
      expect(attributes).toMatch(/\bsrc="\/assets\//);
      expect(body.trim()).toBe("");
    }
    expect(html).not.toMatch(/<style\b/i);
    expect(html).not.toMatch(/\sstyle\s*=/i);
    expect(html).not.toMatch(/\son[a-z]+\s*=/i);
  });

  it("when the built stylesheets are read, then fonts are files of this origin, not data: URIs or other hosts", async () => {
    const assets = path.join(webDist, "assets");
    const sheets = (await readdir(assets)).filter((f) => f.endsWith(".css"));
    expect(sheets.length).toBeGreaterThan(0);
    // A page's own sheet (the report's print rules) may name no file at all; the app's fonts must
    // be named somewhere, and every url() in every sheet must be a file of this origin.
    let named = 0;
    for (const sheet of sheets) {
      const css = await readFile(path.join(assets, sheet), "utf8");
      const urls = [...css.matchAll(/url\(\s*["']?([^"')]+)/g)].map((m) => m[1]);
      named += urls.filter((u) => /\.woff2?$/.test(u)).length;
      for (const url of urls) expect(url, sheet).toMatch(/^\/assets\/[\w.-]+\.(woff2?|svg|png)$/);
    }
    expect(named).toBeGreaterThan(0);
  });
});
