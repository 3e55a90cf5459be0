import { useEffect, useMemo, useState } from "react";
import type { PointTableSpec } from "../../../../../core";
import type { StressUnitName } from "../../../../../core/contract/materials";
import { primaryButton, quietButton } from "../../../lib/forms";
import type { RunState } from "../hooks/use-point-table-run";
import {
  initialDraft,
  mappingIssues,
  parserOptions,
  previewOf,
  type MappingDraft,
  type RememberedMapping,
} from "../model/column-mapping";
import type { PipelineInput } from "../model/pipeline";
import { MappingForm } from "./MappingForm";
import { ProgressLine } from "./ProgressLine";
import { SourcePicker, type TableSource } from "./SourcePicker";

/** How much of a file the mapping screen reads to show its first rows and guess its layout. */
const SAMPLE_BYTES = 16 * 1024;

/**
 * Adding a table: the file or pasted rows, the mapping over its first rows (pre-filled from the
 * project's newest table or a guess), then reading and rating it in the workers with a progress
 * bar and a Cancel button.
 */
export function AddPointTable({
  remembered,
  fallbackUnit,
  spec,
  includeUnsuited,
  run,
  onStart,
  onCancel,
  onSourceChange,
}: {
  remembered: RememberedMapping | null;
  fallbackUnit: StressUnitName;
  spec: PointTableSpec | null;
  includeUnsuited: boolean;
  run: RunState;
  onStart: (input: PipelineInput, source: TableSource, draft: MappingDraft) => void;
  onCancel: () => void;
  onSourceChange: () => void;
}) {
  const [source, setSource] = useState<TableSource | null>(null);
  const [sample, setSample] = useState<string | null>(null);
  const [draft, setDraft] = useState<MappingDraft | null>(null);

  useEffect(() => {
    if (source === null) return;
    let live = true;
    const read =
      source.kind === "file"
        ? source.file.slice(0, SAMPLE_BYTES).text()
        : Promise.resolve(source.text.slice(0, SAMPLE_BYTES));
    void read.then((text) => {
      if (!live) return;
      setSample(text);
      setDraft(initialDraft(text, remembered, fallbackUnit));
    });
    return () => {
      live = false;
    };
    // the guess is made once per source; later changes of the remembered mapping do not undo the engineer's edits
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [source]);

  const preview = useMemo(
    () => (sample !== null && draft !== null ? previewOf(sample, draft) : null),
    [sample, draft],
  );
  const issues = draft !== null && preview !== null ? mappingIssues(draft, preview.fieldCount) : [];
  const running = run.status === "running";

  const start = () => {
    if (source === null || draft === null || preview === null || spec === null || issues.length > 0) return;
    onStart(
      {
        source: source.kind === "file" ? { file: source.file } : { text: source.text },
        options: parserOptions(draft, preview.names),
        spec,
        includeUnsuited,
        columnNames: preview.names,
        // the workers also make what the 3D view draws, so the page does not
        cloud: true,
      },
      source,
      draft,
    );
  };

  return (
    <div className="space-y-3 p-3">
      <SourcePicker
        disabled={running}
        onSource={(s) => {
          setSource(s);
          setSample(null);
          setDraft(null);
          onSourceChange();
        }}
      />
      {source !== null && (
        <p className="text-sm">
          <span className="font-semibold">{source.kind === "file" ? source.file.name : source.name}</span>{" "}
          <span className="num text-graphite-soft">
            {((source.kind === "file" ? source.file.size : source.text.length) / 1e6).toFixed(2)} MB
          </span>
        </p>
      )}
      {draft !== null && preview !== null && (
        <MappingForm draft={draft} preview={preview} issues={issues} onChange={setDraft} />
      )}
      {draft !== null && (
        <div className="flex flex-wrap items-center gap-3">
          {!running && (
            <button
              type="button"
              className={primaryButton}
              disabled={issues.length > 0 || spec === null}
              onClick={start}
            >
              Read and rate the points
            </button>
          )}
          {running && (
            <ProgressLine
              testId="run-progress"
              label={
                run.progress.phase === "parse"
                  ? `Reading in ${run.workers} worker${run.workers === 1 ? "" : "s"}`
                  : "Rating the points"
              }
              fraction={run.progress.fraction}
              onCancel={onCancel}
            />
          )}
          {run.status === "cancelled" && (
            <span className="text-sm text-graphite-soft">Reading was cancelled.</span>
          )}
          {run.status === "failed" && (
            <p role="alert" className="text-sm text-fail">
              <span aria-hidden="true">✗ </span>
              {run.message}
            </p>
          )}
          {source !== null && !running && (
            <button
              type="button"
              className={quietButton}
              onClick={() => {
                setSource(null);
                setDraft(null);
                onSourceChange();
              }}
            >
              Choose another table
            </button>
          )}
        </div>
      )}
    </div>
  );
}
