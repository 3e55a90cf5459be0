import { useNavigate, useOutletContext } from "react-router-dom";
import {
  ROLE_DESCRIPTIONS,
  ROLES,
  roleAtLeast,
  type Role,
  type Workspace,
} from "../../../../../core/contract/workspaces";
import { FormMessage, quietButton } from "../../../lib/forms";
import { useLeaveWorkspace, useRemoveMember, useUpdateMember } from "../../../entities/workspace/mutations";
import { useMembers } from "../../../entities/workspace/queries";
import { formatActivity, formatDate } from "../model/dates";
import { removeMemberQuestion } from "../model/roles";
import { TableScroll } from "../../../components/TableScroll";
import { RoleBadge } from "./RoleBadge";

/** `/workspaces/:id/members`: who is in, with which role; owners change roles and remove people; anyone leaves. */
export function MembersSection() {
  const workspace = useOutletContext<Workspace>();
  const members = useMembers(workspace.id);
  const update = useUpdateMember(workspace.id);
  const remove = useRemoveMember(workspace.id);
  const leave = useLeaveWorkspace();
  const navigate = useNavigate();
  const isOwner = roleAtLeast(workspace.role, "owner");
  return (
    <section aria-labelledby="members-heading" className="space-y-4">
      <h2 id="members-heading" className="text-lg font-semibold">
        Members
      </h2>
      <FormMessage error={update.error ?? remove.error ?? leave.error ?? members.error} />
      {/* On a phone the table scrolls inside its own box, not the page. */}
      <TableScroll label="Members table">
        <table className="w-full border-collapse text-left">
          <thead className="border-b border-rule text-sm text-graphite-soft">
            <tr>
              <th className="px-4 py-2 font-semibold">Name</th>
              <th className="px-4 py-2 font-semibold">Role</th>
              <th className="px-4 py-2 font-semibold">Joined</th>
              <th className="px-4 py-2 font-semibold">Last activity</th>
              <th className="px-4 py-2">
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {members.data?.map((m) => (
              <tr key={m.id} className="border-b border-rule last:border-0">
                <td className="px-4 py-3">
                  <span className="font-semibold">{m.name}</span>
                  {m.isYou && <span className="text-graphite-soft"> (you)</span>}
                  <br />
                  <span className="text-sm text-graphite-soft">{m.email}</span>
                </td>
                <td className="px-4 py-3">
                  {isOwner ? (
                    <select
                      aria-label={`Role of ${m.name}`}
                      value={m.role}
                      className="rounded border border-rule-strong bg-panel px-2 py-1"
                      onChange={(e) =>
                        update.mutate({
                          workspaceId: workspace.id,
                          memberId: m.id,
                          role: e.target.value as Role,
                        })
                      }
                    >
                      {ROLES.map((r) => (
                        <option key={r} value={r}>
                          {r}
                        </option>
                      ))}
                    </select>
                  ) : (
                    <RoleBadge role={m.role} />
                  )}
                </td>
                <td className="num px-4 py-3 text-sm">{formatDate(m.joinedAt)}</td>
                <td className="px-4 py-3 text-sm">{formatActivity(m.lastActiveAt)}</td>
                <td className="px-4 py-3 text-right">
                  {m.isYou ? (
                    <button
                      type="button"
                      className={quietButton}
                      onClick={() => leave.mutate(workspace.id, { onSuccess: () => navigate("/workspaces") })}
                    >
                      Leave
                    </button>
                  ) : (
                    isOwner && (
                      <button
                        type="button"
                        className={quietButton}
                        onClick={() =>
                          window.confirm(removeMemberQuestion(m.name, workspace.name)) &&
                          remove.mutate({ workspaceId: workspace.id, memberId: m.id })
                        }
                      >
                        Remove
                      </button>
                    )
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </TableScroll>
      <dl className="grid gap-x-6 gap-y-1 text-sm text-graphite-soft sm:grid-cols-[auto_1fr]">
        {ROLES.map((r) => (
          <div key={r} className="contents">
            <dt className="font-semibold text-graphite">{r}</dt>
            <dd>{ROLE_DESCRIPTIONS[r]}</dd>
          </div>
        ))}
      </dl>
    </section>
  );
}
