import { useEffect } from "react";

const PRODUCT = "Sigmacube";
/** A workspace's or a project's own page. */
const OWNER_PATH = /^\/workspaces\/[^/]+(\/projects\/[^/]+)?\/?$/;

/**
 * The tab's title for what `main` shows: its heading, then the project or workspace it belongs to
 * (the deepest one linked in the trail above the heading), then the product — "Comparison · CT-7 shell
 * and heads · Sigmacube". An engineer with a bench, a comparison and a record open in three tabs
 * tells them apart, and the browser's history lists pages by name.
 * @param text the heading's text and the trail's last link, as found in the page
 */
export function pageTitle(heading: string | null, trail: string | null): string {
  const parts = [heading, trail].map((s) => s?.replace(/\s+/g, " ").trim()).filter(Boolean);
  return [...new Set(parts), PRODUCT].join(" · ");
}

/**
 * Keeps `document.title` in step with the page in `#main` (the home page is plain "Sigmacube"). Pages render their heading once their
 * data arrives, so this watches the subtree rather than reading it once per navigation.
 */
export function usePageTitle() {
  useEffect(() => {
    const main = document.getElementById("main");
    if (!main) return;
    const update = () => {
      // The home page is the product itself; its heading is a sentence, not a name.
      if (window.location.pathname === "/") {
        document.title = PRODUCT;
        return;
      }
      const heading = main.querySelector("h1");
      // The trail is the line just above the heading, or the first line of the block above it.
      const above = heading?.previousElementSibling;
      const trailLine = above?.tagName === "P" ? above : above?.querySelector("p");
      const trailLinks = trailLine?.querySelectorAll("a");
      const links = trailLinks ? [...trailLinks] : [];
      // What the page belongs to is the deepest workspace or project in the trail, not a section of
      // it ("Stress linearization · CT-7 nozzle N2", not "… · Comparison").
      const owner = links.filter((a) => OWNER_PATH.test(a.pathname)).at(-1) ?? links.at(-1);
      const trail = owner?.textContent ?? null;
      const next = pageTitle(heading?.textContent ?? null, trail);
      if (document.title !== next) document.title = next;
    };
    update();
    const observer = new MutationObserver(update);
    observer.observe(main, { childList: true, subtree: true, characterData: true });
    return () => observer.disconnect();
  }, []);
}
