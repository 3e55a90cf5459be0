import { useState } from "react";
import { useLocation } from "react-router-dom";

/**
 * Copies the address of exactly this page. A member who opens it signed out is sent to
 * sign-in and then back here (the session guard keeps the path); a non-member sees "not found".
 */
export function CopyLinkButton() {
  const location = useLocation();
  const [copied, setCopied] = useState<"idle" | "copied" | "failed">("idle");
  const url = `${window.location.origin}${location.pathname}${location.search}${location.hash}`;
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(url);
      setCopied("copied");
    } catch {
      setCopied("failed");
    }
    window.setTimeout(() => setCopied("idle"), 2500);
  };
  return (
    <span className="inline-flex items-center gap-2">
      <button
        type="button"
        onClick={copy}
        data-link={url}
        className="rounded border border-rule-strong bg-panel px-3 py-1.5 text-sm hover:border-ink hover:text-ink"
      >
        Copy link to this page
      </button>
      <span role="status" className="text-sm text-graphite-soft">
        {copied === "copied"
          ? "✓ Copied — members who open it land here."
          : copied === "failed"
            ? `Copy this address: ${url}`
            : ""}
      </span>
    </span>
  );
}
