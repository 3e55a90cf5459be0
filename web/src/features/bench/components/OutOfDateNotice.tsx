import { useBenchStore } from "../model/store";

/**
 * The notice a results panel shows instead of its results while an input cell holds something that
 * is not an acceptable stress: the stored tensor is then not what the user sees, so any number or
 * verdict drawn from it would be out of date.
 */
export function OutOfDateNotice() {
  const cells = useBenchStore((s) => s.invalidInputs);
  return (
    <p
      role="status"
      data-testid="results-out-of-date"
      className="rounded-sm border border-dashed border-rule-strong bg-paper px-2 py-1.5 text-[13px] leading-5 text-graphite"
    >
      <strong className="font-semibold">Out of date</strong> — {cells.join(", ")}{" "}
      {cells.length === 1 ? "holds" : "hold"} no valid stress. Results and verdicts come back when the input
      is a valid number again (Esc in the cell restores its value).
    </p>
  );
}
