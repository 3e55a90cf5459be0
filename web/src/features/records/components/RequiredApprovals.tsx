import { useParams } from "react-router-dom";
import type { RequiredApprovals as Count } from "../../../entities/record/api-types";
import { useUpdateReview } from "../../../entities/record/mutations";
import type { Role } from "../../../../../core/contract/workspaces";
import { FormMessage } from "../../../lib/forms";
import { reviewActionNote } from "../../../lib/role-note";

/** How many approvals a record needs; owners choose one or two, everyone else reads it. */
export function RequiredApprovals({ current, role }: { current: Count; role: Role }) {
  const { workspaceId = "", projectId = "" } = useParams();
  const update = useUpdateReview(workspaceId, projectId);
  const note = reviewActionNote(role, "set-approvals");
  if (note) {
    return (
      <div className="px-3 py-2 text-[14px]">
        <p>
          A record is approved after <span className="num">{current}</span>{" "}
          {current === 1 ? "approval" : "independent approvals"}.
        </p>
        <p className="text-[13px] text-graphite-soft">{note}</p>
      </div>
    );
  }
  // While the owner's choice is on its way, the radio shows it rather than jump back.
  const shown = (update.isPending ? update.variables?.requiredApprovals : undefined) ?? current;
  return (
    <fieldset className="space-y-1 px-3 py-2 text-[14px]">
      <legend className="sr-only">Approvals a record needs</legend>
      {([1, 2] as const).map((n) => (
        <label key={n} className="flex items-center gap-2">
          <input
            type="radio"
            name="required-approvals"
            value={n}
            checked={shown === n}
            disabled={update.isPending}
            onChange={() => update.mutate({ requiredApprovals: n })}
          />
          {n === 1 ? "One approval by an independent checker" : "Two approvals by two independent checkers"}
        </label>
      ))}
      <FormMessage error={update.error} />
    </fieldset>
  );
}
