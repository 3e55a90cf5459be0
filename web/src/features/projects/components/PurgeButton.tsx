import { useState } from "react";
import type { TrashKind } from "../../../../../core/contract/projects";
import { FormMessage, quietButton } from "../../../lib/forms";
import { usePurge } from "../../../entities/trash/mutations";

/**
 * Deletes one trashed item for good (owners only). Nothing goes on a single click: the owner
 * types the item's name into the confirmation that opens, and only then can it be deleted.
 */
export function PurgeButton({
  workspaceId,
  item,
}: {
  workspaceId: string;
  item: { kind: TrashKind; id: string; name: string };
}) {
  const purge = usePurge(workspaceId);
  const [open, setOpen] = useState(false);
  const [typed, setTyped] = useState("");
  const label = `Delete ${item.kind} ${item.name} for good`;
  if (!open) {
    return (
      <button type="button" className={quietButton} aria-label={label} onClick={() => setOpen(true)}>
        Delete for good…
      </button>
    );
  }
  const matches = typed.trim() === item.name.trim();
  return (
    <form
      aria-label={label}
      className="basis-full space-y-2 rounded-sm border border-fail/40 bg-panel p-2"
      onSubmit={(e) => {
        e.preventDefault();
        if (matches) purge.mutate({ kind: item.kind, id: item.id });
      }}
    >
      <p className="text-[13px] text-fail">
        Deleting for good cannot be undone: the {item.kind} and everything in it are removed for every member.
      </p>
      <label className="flex flex-wrap items-center gap-2 text-[13px]">
        Type <strong>{item.name}</strong> to confirm
        <input
          value={typed}
          onChange={(e) => setTyped(e.target.value)}
          className="min-w-48 rounded-sm border border-rule-strong bg-panel px-2 py-1"
        />
      </label>
      <div className="flex gap-2">
        <button
          type="submit"
          disabled={!matches || purge.isPending}
          className="rounded bg-fail px-3 py-1.5 text-sm font-semibold text-panel disabled:opacity-50"
        >
          Delete for good
        </button>
        <button type="button" className={quietButton} onClick={() => (setOpen(false), setTyped(""))}>
          Cancel
        </button>
      </div>
      <FormMessage error={purge.error} />
    </form>
  );
}
