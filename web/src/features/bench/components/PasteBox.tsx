import { useEffect, useId, useState } from "react";
import { DecimalMarkSelect, PasteProblemChoices } from "../../../components/PasteChoices";
import { useDecimalPreference } from "../../../lib/paste-preferences";
import { useBenchStore } from "../model/store";

/**
 * A box for what engineers copy from spreadsheets, FE result windows and hand notes, read by core's
 * parseTensor. A failed read names the place and leaves the tensor untouched; the text stays too.
 * When the failure is one a choice resolves (an ambiguous comma, six values without their order),
 * the choice is offered right there and reads the same text again. The decimal mark is the user's
 * own, remembered in this browser.
 */
export function PasteBox() {
  const error = useBenchStore((s) => s.pasteError);
  const note = useBenchStore((s) => s.pasteNote);
  const problem = useBenchStore((s) => s.pasteProblem);
  const act = useBenchStore((s) => s.act);
  const [decimal, setDecimal] = useDecimalPreference();
  const [text, setText] = useState("");
  const id = useId();

  // The store reads every paste (box or grid) with the user's mark.
  useEffect(() => act.setPasteDecimal(decimal), [act, decimal]);

  return (
    <div>
      <label htmlFor={id} className="block text-[12px] text-graphite-soft">
        Paste a tensor (3×3, six components with a header such as{" "}
        <span className="font-mono">sx sy sz sxy syz sxz</span>, a listing row headed{" "}
        <span className="font-mono">Node …</span> or <span className="font-mono">Elem …</span>, or σx σy τxy)
      </label>
      <div className="mt-0.5 flex gap-1.5">
        <textarea
          id={id}
          rows={3}
          value={text}
          spellCheck={false}
          aria-invalid={error !== null}
          aria-describedby={error ? `${id}-error` : note ? `${id}-note` : undefined}
          onChange={(e) => setText(e.target.value)}
          onKeyDown={(e) => {
            if (e.key === "Enter" && (e.ctrlKey || e.metaKey)) act.applyPaste(text);
          }}
          placeholder={"67.5  0  0\n0  33.75  0 …  MPa"}
          className={`num min-w-0 flex-1 resize-none rounded-sm border bg-white px-1.5 py-1 text-[12px] leading-4 ${error ? "border-fail" : "border-rule"}`}
        />
        <button
          type="button"
          onClick={() => act.applyPaste(text)}
          className="self-stretch rounded-sm border border-ink px-2 text-[13px] font-semibold text-ink hover:bg-ink-wash"
        >
          Read
        </button>
      </div>
      <div className="mt-1">
        <DecimalMarkSelect value={decimal} onChange={setDecimal} />
      </div>
      {error && (
        <div id={`${id}-error`} role="alert" className="mt-1 text-[12px] leading-4 text-fail">
          <p>
            <span aria-hidden="true">✗ </span>Not read — {error}. The values above are unchanged.
          </p>
          {problem && (
            <PasteProblemChoices
              problem={problem.problem}
              onDecimal={(mark) => {
                setDecimal(mark);
                act.applyPaste(problem.text, { decimal: mark });
              }}
              onOrder={(order) => act.applyPaste(problem.text, { order })}
            />
          )}
        </div>
      )}
      {!error && note && (
        <p id={`${id}-note`} role="status" className="mt-1 text-[12px] leading-4 text-graphite-soft">
          {note}
        </p>
      )}
    </div>
  );
}
