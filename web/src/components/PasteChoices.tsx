import { useId } from "react";
import { COMMON_SIX_ORDERS, type Component, type ParseProblem } from "../../../core";
import { DECIMAL_CHOICE_LABELS, type DecimalPreference } from "../lib/paste-preferences";
import { orderInSymbols } from "../lib/stress";

/** The decimal mark pastes are read with, as a compact select (the choice is remembered per user). */
export function DecimalMarkSelect({
  value,
  onChange,
}: {
  value: DecimalPreference;
  onChange: (next: DecimalPreference) => void;
}) {
  const id = useId();
  return (
    <div className="flex min-w-0 items-center gap-1.5 text-[12px]">
      <label htmlFor={id} className="shrink-0 text-graphite-soft">
        Decimal mark
      </label>
      <select
        id={id}
        value={value}
        onChange={(e) => onChange(e.target.value as DecimalPreference)}
        className="min-w-0 flex-1 rounded-sm border border-rule bg-white px-1 py-0.5"
      >
        {(Object.keys(DECIMAL_CHOICE_LABELS) as DecimalPreference[]).map((k) => (
          <option key={k} value={k}>
            {DECIMAL_CHOICE_LABELS[k]}
          </option>
        ))}
      </select>
    </div>
  );
}

/**
 * The way out of a refusal that a choice resolves: for an ambiguous comma, read it as a decimal
 * comma or as a value separator; for six bare values, one of the two common component orders
 * (normal stresses, then τxy and the other two shears in either order; common practice).
 */
export function PasteProblemChoices({
  problem,
  onDecimal,
  onOrder,
}: {
  problem: ParseProblem;
  onDecimal: (mark: "." | ",") => void;
  onOrder: (order: readonly Component[]) => void;
}) {
  const button =
    "rounded-sm border border-ink px-1.5 py-0.5 text-left text-[12px] font-semibold text-ink hover:bg-ink-wash";
  if (problem === "ambiguous-comma") {
    return (
      <div role="group" aria-label="Read the commas as" className="mt-1 flex flex-wrap gap-1">
        <button type="button" className={button} onClick={() => onDecimal(",")}>
          Comma is the decimal mark (1,5 = 1.5)
        </button>
        <button type="button" className={button} onClick={() => onDecimal(".")}>
          Commas separate values
        </button>
      </div>
    );
  }
  if (problem === "order-needed") {
    return (
      <div role="group" aria-label="Order of the six values" className="mt-1 flex flex-col gap-1">
        {Object.values(COMMON_SIX_ORDERS).map((order) => (
          <button key={order.join()} type="button" className={`num ${button}`} onClick={() => onOrder(order)}>
            Read as {orderInSymbols(order)}
          </button>
        ))}
      </div>
    );
  }
  return null;
}
