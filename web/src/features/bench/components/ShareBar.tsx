import { useState } from "react";
import { ToolButton } from "../../../components/ToolButton";
import { currentLink } from "../hooks/use-url-sync";
import { resultsAsText } from "../model/results-text";
import { selectInputValid } from "../model/bench-state";
import { useBenchStore } from "../model/store";

/** Copies the link that reproduces this bench, or the results as an aligned text block. */
export function ShareBar() {
  const [message, setMessage] = useState<string | null>(null);
  const [fallback, setFallback] = useState<string | null>(null);
  const inputValid = useBenchStore(selectInputValid); // no results text for an input that is not valid

  async function copy(text: string, what: string) {
    try {
      await navigator.clipboard.writeText(text);
      setFallback(null);
      setMessage(`${what} copied.`);
    } catch {
      // Clipboard refused (permissions, plain http): show the text to copy by hand.
      setFallback(text);
      setMessage(`${what} could not be copied automatically; select it below.`);
    }
  }

  return (
    <div className="flex items-center gap-1.5">
      <ToolButton onClick={() => copy(currentLink(), "Link")}>Copy link</ToolButton>
      <ToolButton
        disabled={!inputValid}
        onClick={() => copy(resultsAsText(useBenchStore.getState(), currentLink()), "Results")}
      >
        Copy results as text
      </ToolButton>
      <span role="status" className="min-w-0 text-[12px] text-graphite-soft">
        {message}
      </span>
      {fallback && (
        <textarea
          readOnly
          aria-label="Text to copy"
          value={fallback}
          className="num absolute right-4 top-24 z-20 h-40 w-96 border border-rule bg-panel p-2 text-[11px]"
        />
      )}
    </div>
  );
}
