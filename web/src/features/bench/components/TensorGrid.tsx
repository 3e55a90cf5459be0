import type { ClipboardEvent } from "react";
import { stressInputProblem } from "../../../../../core";
import { NumberField } from "../../../components/NumberField";
import { looksLikeSeveralNumbers } from "../../../lib/number-text";
import { Sym } from "../../../components/Sym";
import { componentAt } from "../model/actions";
import { editable } from "../model/format";
import { useBenchStore } from "../model/store";

const AXES = ["x", "y", "z"] as const;

/** Accessible name of a grid cell: σxx, τxy, τyx … (τyx and τxy are one stored component). */
function cellLabel(i: number, j: number): string {
  return `${i === j ? "σ" : "τ"}${AXES[i]}${AXES[j]}`;
}

/** Pasting more than one number anywhere on the grid reads the whole paste as a tensor. */
export function pasteLooksLikeTensor(text: string): boolean {
  return looksLikeSeveralNumbers(text); // "1,5" is one number for this cell, not two
}

/**
 * The 3×3 stress tensor in x y z. Editing τxy writes τyx too: both cells show the one stored
 * component, so the grid is symmetric by construction.
 */
export function TensorGrid() {
  const tensor = useBenchStore((s) => s.tensor);
  const unit = useBenchStore((s) => s.unit);
  const act = useBenchStore((s) => s.act);

  function onPaste(event: ClipboardEvent<HTMLDivElement>) {
    const text = event.clipboardData.getData("text/plain");
    if (!pasteLooksLikeTensor(text)) return;
    event.preventDefault();
    // A focused cell shows its own draft, not the store: leave it first (an entry typed there and
    // not yet committed lands before the paste), read the paste, then come back once React has
    // drawn the new values, so the cell shows what was pasted and keyboard focus stays put.
    const cell = event.target instanceof HTMLInputElement ? event.target : null;
    cell?.blur();
    act.applyPaste(text);
    if (cell) requestAnimationFrame(() => cell.focus());
  }

  return (
    <div onPaste={onPaste} role="group" aria-label={`Stress tensor σ in x y z, ${unit}`}>
      <div className="grid grid-cols-[1.25rem_repeat(3,minmax(0,1fr))] gap-1 text-[12px] text-graphite-soft">
        <span aria-hidden="true" />
        {AXES.map((a) => (
          <span key={a} aria-hidden="true" className="text-center font-mono">
            {a}
          </span>
        ))}
        {AXES.map((row, i) => (
          <div key={row} className="contents">
            <span aria-hidden="true" className="self-center font-mono">
              {row}
            </span>
            {AXES.map((col, j) => {
              const c = componentAt(i, j);
              return (
                <NumberField
                  key={col}
                  label={cellLabel(i, j)}
                  hideLabel
                  value={tensor[c]}
                  format={editable}
                  onCommit={(v) => act.setComponent(c, v ?? 0)}
                  check={stressInputProblem}
                  onValidityChange={(valid) => act.setInputValidity(cellLabel(i, j), valid)}
                  inputClassName={i === j ? "" : "bg-paper/40"}
                />
              );
            })}
          </div>
        ))}
      </div>
      <p className="mt-1 text-[12px] text-graphite-soft">
        Symmetric: <Sym base="τ" sub="xy" /> = <Sym base="τ" sub="yx" /> and so on; tension positive.
      </p>
    </div>
  );
}
