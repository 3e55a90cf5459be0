import { useState } from "react";
import { Link } from "react-router-dom";
import type { StressTensor } from "../../../../../core";
import { calculatorBenchLink } from "../model/bench-link";
import type { UnitSet } from "../model/units";

/**
 * "Send to bench" for a calculated state (the tensor in the calculator's frame, in its unit set's stress unit), and a
 * button that copies this page's address with every input in it.
 */
export function SendToBench({
  tensor,
  units,
  label = "Send to bench",
  testId = "send-to-bench",
}: {
  tensor: StressTensor;
  units: UnitSet;
  label?: string;
  testId?: string;
}) {
  return (
    <Link
      to={calculatorBenchLink(tensor, units)}
      data-testid={testId}
      className="inline-block rounded border border-ink bg-ink px-3 py-1.5 text-sm font-semibold text-white no-underline hover:bg-ink-hover"
    >
      {label} →
    </Link>
  );
}

/** Copies the page's address (every input is in it), saying so in words. */
export function CopyInputsLink() {
  const [said, setSaid] = useState("");
  const copy = async () => {
    const url = window.location.href;
    try {
      await navigator.clipboard.writeText(url);
      setSaid("✓ Copied: the link reopens these inputs.");
    } catch {
      setSaid(`Copy this address: ${url}`);
    }
  };
  return (
    <span className="inline-flex flex-wrap items-center gap-2">
      <button
        type="button"
        onClick={copy}
        className="rounded border border-rule-strong bg-panel px-3 py-1.5 text-sm hover:border-ink hover:text-ink"
      >
        Copy link with these inputs
      </button>
      <span role="status" className="text-sm text-graphite-soft">
        {said}
      </span>
    </span>
  );
}
