import { useState, type DragEvent } from "react";
import { quietButton } from "../../../lib/forms";

/** A table to read: a file chosen or dropped, or rows pasted. */
export type TableSource = { kind: "file"; file: File } | { kind: "text"; text: string; name: string };

/** Drop a CSV/TSV/whitespace file, choose one, or paste rows. */
export function SourcePicker({
  onSource,
  disabled,
}: {
  onSource: (s: TableSource) => void;
  disabled: boolean;
}) {
  const [over, setOver] = useState(false);
  const [pasting, setPasting] = useState(false);
  const [text, setText] = useState("");
  const onDrop = (e: DragEvent) => {
    e.preventDefault();
    setOver(false);
    const file = e.dataTransfer.files[0];
    if (file && !disabled) onSource({ kind: "file", file });
  };
  return (
    <div className="space-y-2">
      <div
        onDragOver={(e) => (e.preventDefault(), setOver(true))}
        onDragLeave={() => setOver(false)}
        onDrop={onDrop}
        className={`rounded border border-dashed px-4 py-5 text-center ${over ? "border-ink bg-paper-deep" : "border-rule-strong"}`}
      >
        <p className="text-[15px]">Drop a point table here (CSV, TSV, semicolon- or space-separated text)</p>
        <p className="mt-1 text-sm text-graphite-soft">
          or{" "}
          <label className="cursor-pointer text-ink underline underline-offset-2">
            choose a file
            <input
              type="file"
              className="sr-only"
              accept=".csv,.tsv,.txt,.dat,text/plain,text/csv"
              data-testid="point-table-file"
              disabled={disabled}
              onChange={(e) => {
                const file = e.target.files?.[0];
                if (file) onSource({ kind: "file", file });
                e.target.value = "";
              }}
            />
          </label>{" "}
          or{" "}
          <button
            type="button"
            className="text-ink underline underline-offset-2"
            onClick={() => setPasting(!pasting)}
          >
            paste rows
          </button>
        </p>
      </div>
      {pasting && (
        <div className="space-y-2">
          <label htmlFor="point-table-paste" className="block text-sm font-semibold">
            Rows of a point table
          </label>
          <textarea
            id="point-table-paste"
            rows={6}
            value={text}
            onChange={(e) => setText(e.target.value)}
            className="num w-full rounded border border-rule-strong bg-panel px-2 py-1 text-[13px]"
          />
          <button
            type="button"
            className={quietButton}
            disabled={disabled || text.trim() === ""}
            onClick={() => onSource({ kind: "text", text, name: "pasted rows.txt" })}
          >
            Use these rows
          </button>
        </div>
      )}
    </div>
  );
}
