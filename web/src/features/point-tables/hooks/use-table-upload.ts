import { useQueryClient } from "@tanstack/react-query";
import { useCallback, useEffect, useRef, useState } from "react";
import type { CreatePointTableBody, UploadSummary } from "../../../entities/point-table/contract";
import { pointTableKeys } from "../../../entities/point-table/keys";
import { useCreatePointTable, useDeletePointTable } from "../../../entities/point-table/mutations";
import { UploadCancelled, sha256Hex, uploadPointTableContent } from "../../../entities/point-table/upload";

export type UploadState =
  | { status: "idle" }
  | { status: "hashing" }
  | { status: "sending"; fraction: number }
  | { status: "done"; tableId: string; summary: UploadSummary }
  | { status: "cancelled" }
  | { status: "failed"; error: unknown };

type Ids = { workspaceId: string; projectId: string; caseId: string };

/**
 * Stores a table in the project: its hash, then its record (name, size, hash, mapping), then its
 * bytes with progress. Cancelling stops the bytes and removes the record just made, so a
 * cancelled upload leaves nothing behind.
 */
export function useTableUpload(ids: Ids) {
  const queryClient = useQueryClient();
  const create = useCreatePointTable(ids.workspaceId, ids.projectId, ids.caseId);
  const remove = useDeletePointTable(ids.workspaceId, ids.projectId, ids.caseId);
  const [state, setState] = useState<UploadState>({ status: "idle" });
  const abortRef = useRef<(() => void) | null>(null);
  const cancelledRef = useRef(false);

  useEffect(() => () => abortRef.current?.(), []);

  const start = useCallback(
    async (body: Blob, fields: Omit<CreatePointTableBody, "sha256" | "sizeBytes">) => {
      cancelledRef.current = false;
      setState({ status: "hashing" });
      let tableId: string | null = null;
      try {
        const sha256 = await sha256Hex(body);
        if (cancelledRef.current) throw new UploadCancelled();
        const created = await create.mutateAsync({ ...fields, sha256, sizeBytes: body.size });
        tableId = created.id;
        setState({ status: "sending", fraction: 0 });
        const upload = uploadPointTableContent({ ...ids, tableId }, body, (sent, total) =>
          setState({ status: "sending", fraction: total > 0 ? sent / total : 0 }),
        );
        abortRef.current = upload.abort;
        if (cancelledRef.current) upload.abort();
        const summary = await upload.done;
        abortRef.current = null;
        setState({ status: "done", tableId, summary });
      } catch (error) {
        abortRef.current = null;
        if (error instanceof UploadCancelled) {
          setState({ status: "cancelled" });
          if (tableId !== null) await remove.mutateAsync(tableId).catch(() => undefined);
        } else {
          setState({ status: "failed", error });
        }
      } finally {
        await queryClient.invalidateQueries({
          queryKey: pointTableKeys.list(ids.workspaceId, ids.projectId, ids.caseId),
        });
      }
    },
    [queryClient, ids, create, remove],
  );

  const cancel = useCallback(() => {
    cancelledRef.current = true;
    abortRef.current?.();
  }, []);

  return { state, start, cancel };
}
