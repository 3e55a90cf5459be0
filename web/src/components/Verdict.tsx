/**
 * A verdict in three states, always as a word and a mark as well as a colour, so it reads the
 * same in greyscale and to colour-blind eyes.
 */
export type VerdictState = "pass" | "close" | "fail";

const LOOK: Readonly<Record<VerdictState, { word: string; mark: string; className: string }>> = {
  pass: { word: "passes", mark: "✓", className: "text-pass bg-pass-wash border-pass/40" },
  close: { word: "close", mark: "≈", className: "text-close bg-close-wash border-close/40" },
  fail: { word: "fails", mark: "✗", className: "text-fail bg-fail-wash border-fail/40" },
};

/** The verdict word with its mark, e.g. "✓ passes". `label` replaces the word when given. */
export function Verdict({
  state,
  label,
  className = "",
}: {
  state: VerdictState;
  label?: string;
  className?: string;
}) {
  const look = LOOK[state];
  return (
    <span
      className={`inline-flex items-center gap-1 rounded-sm border px-1.5 py-px text-[13px] font-semibold leading-5 ${look.className} ${className}`}
    >
      <span aria-hidden="true" className="font-mono">
        {look.mark}
      </span>
      <span>{label ?? look.word}</span>
    </span>
  );
}
