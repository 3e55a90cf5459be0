import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { useOutletContext } from "react-router-dom";
import {
  createInvitationBodySchema,
  type CreateInvitationBody,
} from "../../../../../core/contract/invitations";
import { ROLES, type Workspace } from "../../../../../core/contract/workspaces";
import { applyServerErrors, Field, FormMessage, primaryButton, quietButton } from "../../../lib/forms";
import { useCreateInvitation } from "../api/create-invitation";
import { useInvitations } from "../api/list-invitations";
import { useResendInvitation } from "../api/resend-invitation";
import { useRevokeInvitation } from "../api/revoke-invitation";
import { formatDate } from "../model/dates";
import {
  canResendOrRevoke,
  INVITATION_STATE_WORDS,
  invitationErrorAboveTable,
  isAlreadyInvited,
} from "../model/invitations";
import { TableScroll } from "../../../components/TableScroll";
import { RoleBadge } from "./RoleBadge";
import { sectionRefusal } from "../model/roles";
import { SectionRefusal } from "./SectionRefusal";

/** `/workspaces/:id/invitations` (owners): invite by e-mail, see each invitation's state, resend or revoke. */
export function InvitationsSection() {
  const workspace = useOutletContext<Workspace>();
  const refusal = sectionRefusal(workspace.role, "invitations");
  if (refusal) return <SectionRefusal headingId="invitations-heading" title="Invitations" reason={refusal} />;
  return <InvitationsControls workspace={workspace} />;
}

function InvitationsControls({ workspace }: { workspace: Workspace }) {
  const invitations = useInvitations(workspace.id, true);
  const create = useCreateInvitation(workspace.id);
  const resend = useResendInvitation(workspace.id);
  const revoke = useRevokeInvitation(workspace.id);
  const form = useForm<CreateInvitationBody>({
    resolver: zodResolver(createInvitationBodySchema),
    defaultValues: { email: "", role: "viewer" },
  });
  const onSubmit = form.handleSubmit((body) =>
    create.mutate(
      { workspaceId: workspace.id, body },
      {
        onSuccess: () => form.reset({ email: "", role: body.role }),
        onError: (error) => {
          if (isAlreadyInvited(error)) form.setError("email", { type: "server", message: error.message });
          else applyServerErrors(error, form.setError, ["email", "role"]);
        },
      },
    ),
  );
  const createError = invitationErrorAboveTable(create.error);
  return (
    <section aria-labelledby="invitations-heading" className="space-y-4">
      <h2 id="invitations-heading" className="text-lg font-semibold">
        Invitations
      </h2>
      <form
        onSubmit={onSubmit}
        noValidate
        className="grid items-start gap-3 rounded border border-rule bg-panel p-4 sm:grid-cols-[1fr_12rem_auto]"
      >
        <Field
          id="invite-email"
          label="E-mail address"
          type="email"
          placeholder="name@example.com"
          error={form.formState.errors.email?.message}
          {...form.register("email")}
        />
        <div className="space-y-1">
          <label htmlFor="invite-role" className="block text-sm font-semibold">
            Role
          </label>
          <select
            id="invite-role"
            className="w-full rounded border border-rule-strong bg-panel px-2 py-2"
            {...form.register("role")}
          >
            {ROLES.map((r) => (
              <option key={r} value={r}>
                {r}
              </option>
            ))}
          </select>
        </div>
        <button type="submit" className={`${primaryButton} sm:mt-6`} disabled={create.isPending}>
          Send invitation
        </button>
      </form>
      <FormMessage error={createError ?? resend.error ?? revoke.error} />
      {create.isSuccess && (
        <p role="status" className="text-sm text-pass">
          ✓ Invitation mailed to {create.data.invitation.email}; it is valid for 7 days.
        </p>
      )}
      {/* On a phone the table scrolls inside its own box, not the page. */}
      <TableScroll label="Invitations table">
        <table className="w-full border-collapse text-left">
          <thead className="border-b border-rule text-sm text-graphite-soft">
            <tr>
              <th className="px-4 py-2 font-semibold">Address</th>
              <th className="px-4 py-2 font-semibold">Role</th>
              <th className="px-4 py-2 font-semibold">State</th>
              <th className="px-4 py-2 font-semibold">Expires</th>
              <th className="px-4 py-2">
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {invitations.data?.length === 0 && (
              <tr>
                <td colSpan={5} className="px-4 py-3 text-graphite-soft">
                  No invitations yet.
                </td>
              </tr>
            )}
            {invitations.data?.map((i) => (
              <tr key={i.id} className="border-b border-rule last:border-0">
                <td className="px-4 py-3">
                  {i.email}
                  <br />
                  <span className="text-sm text-graphite-soft">
                    by {i.invitedByName ?? "a former member"}, sent <span className="num">{i.sendCount}</span>
                    ×
                  </span>
                </td>
                <td className="px-4 py-3">
                  <RoleBadge role={i.role} />
                </td>
                <td className="px-4 py-3">{INVITATION_STATE_WORDS[i.state]}</td>
                <td className="num px-4 py-3 text-sm">{formatDate(i.expiresAt)}</td>
                <td className="space-x-2 px-4 py-3 text-right">
                  {canResendOrRevoke(i.state) && (
                    <>
                      <button
                        type="button"
                        className={quietButton}
                        onClick={() => resend.mutate({ workspaceId: workspace.id, invitationId: i.id })}
                      >
                        Resend
                      </button>
                      <button
                        type="button"
                        className={quietButton}
                        onClick={() => revoke.mutate({ workspaceId: workspace.id, invitationId: i.id })}
                      >
                        Revoke
                      </button>
                    </>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </TableScroll>
    </section>
  );
}
