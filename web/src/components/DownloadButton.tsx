import { useRef, useState } from "react";
import {
  fetchFileWithProgress,
  progressText,
  saveFile,
  type DownloadProgress,
} from "../lib/download-progress";

type State =
  { kind: "idle" } | { kind: "loading"; progress: DownloadProgress } | { kind: "failed"; message: string };

/**
 * A button that downloads a file the server builds (a PDF report), showing how far it has come and
 * offering Cancel while it runs, so a large report never leaves the page silent.
 */
export function DownloadButton({
  path,
  fileName,
  label,
  className,
}: {
  /** API path under /api. */
  path: string;
  /** Name to save under when the server gives none. */
  fileName: string;
  label: string;
  className: string;
}) {
  const [state, setState] = useState<State>({ kind: "idle" });
  const controller = useRef<AbortController | null>(null);

  const start = async () => {
    const abort = new AbortController();
    controller.current = abort;
    setState({ kind: "loading", progress: { received: 0, total: null } });
    try {
      const file = await fetchFileWithProgress(
        path,
        fileName,
        (progress) => setState({ kind: "loading", progress }),
        abort.signal,
      );
      saveFile(file.blob, file.name);
      setState({ kind: "idle" });
    } catch (error) {
      if (abort.signal.aborted) setState({ kind: "idle" });
      else setState({ kind: "failed", message: error instanceof Error ? error.message : String(error) });
    } finally {
      controller.current = null;
    }
  };

  if (state.kind === "loading") {
    const { received, total } = state.progress;
    return (
      <span className="inline-flex items-center gap-2" data-testid="download-progress">
        <progress
          className="h-2 w-28 accent-ink"
          aria-label={`${label}: ${progressText(state.progress)}`}
          {...(total ? { value: received, max: total } : {})}
        />
        <span className="num text-sm text-graphite-soft" aria-live="polite">
          {progressText(state.progress)}
        </span>
        <button type="button" className={className} onClick={() => controller.current?.abort()}>
          Cancel
        </button>
      </span>
    );
  }
  return (
    <span className="inline-flex items-center gap-2">
      <button type="button" className={className} onClick={() => void start()}>
        {label}
      </button>
      {state.kind === "failed" && (
        <span role="alert" className="text-sm text-fail">
          {state.message}
        </span>
      )}
    </span>
  );
}
