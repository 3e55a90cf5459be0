import { useId, useState } from "react";
import { useBenchStore } from "../model/store";

/**
 * A box for what engineers copy from spreadsheets, FE result windows and hand notes, read by core's
 * parseTensor. A failed read names the place and leaves the tensor untouched; the text stays too.
 */
export function PasteBox() {
  const error = useBenchStore((s) => s.pasteError);
  const note = useBenchStore((s) => s.pasteNote);
  const act = useBenchStore((s) => s.act);
  const [text, setText] = useState("");
  const id = useId();
  return (
    <div>
      <label htmlFor={id} className="block text-[12px] text-graphite-soft">
        Paste a tensor (3×3, six components with a header such as{" "}
        <span className="font-mono">sxx syy szz sxy syz szx</span>, or σx σy τxy)
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
      {error && (
        <p id={`${id}-error`} role="alert" className="mt-1 text-[12px] leading-4 text-fail">
          <span aria-hidden="true">✗ </span>Not read — {error}. The values above are unchanged.
        </p>
      )}
      {!error && note && (
        <p id={`${id}-note`} role="status" className="mt-1 text-[12px] leading-4 text-graphite-soft">
          {note}
        </p>
      )}
    </div>
  );
}
