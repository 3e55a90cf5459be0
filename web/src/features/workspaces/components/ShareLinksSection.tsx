import { useState } from "react";
import { useForm } from "react-hook-form";
import { useOutletContext } from "react-router-dom";
import { SHARE_LINK_MAX_DAYS, SHARE_LINK_ROLES } from "../../../../../core/contract/share-links";
import type { Workspace } from "../../../../../core/contract/workspaces";
import { fieldErrorsOf } from "../../../lib/api-client";
import { FormMessage, primaryButton, quietButton } from "../../../lib/forms";
import { useCreateShareLink } from "../api/create-share-link";
import { useShareLinks } from "../api/list-share-links";
import { useRevokeShareLink } from "../api/revoke-share-link";
import { formatDate } from "../model/dates";
import {
  canRevokeShareLink,
  checkShareLinkForm,
  SHARE_LINK_FORM_DEFAULTS,
  SHARE_LINK_STATE_WORDS,
  shareLinkUses,
  type ShareLinkFormValues,
} from "../model/share-links";
import { TableScroll } from "../../../components/TableScroll";
import { RoleBadge } from "./RoleBadge";
import { sectionRefusal } from "../model/roles";
import { SectionRefusal } from "./SectionRefusal";

/** `/workspaces/:id/share-links` (editors, owners): links that let a signed-in person join with a role. */
export function ShareLinksSection() {
  const workspace = useOutletContext<Workspace>();
  const refusal = sectionRefusal(workspace.role, "share-links");
  if (refusal) return <SectionRefusal headingId="links-heading" title="Share links" reason={refusal} />;
  return <ShareLinksControls workspace={workspace} />;
}

function ShareLinksControls({ workspace }: { workspace: Workspace }) {
  const links = useShareLinks(workspace.id, true);
  const create = useCreateShareLink(workspace.id);
  const revoke = useRevokeShareLink(workspace.id);
  const [copied, setCopied] = useState(false);
  const form = useForm<ShareLinkFormValues>({ defaultValues: SHARE_LINK_FORM_DEFAULTS });
  // The inputs hold text; the body is checked with the same shared schema the server uses,
  // here before sending and there again, and either side's field errors appear beside the field.
  const [clientErrors, setClientErrors] = useState<Record<string, string>>({});
  const serverErrors = { ...fieldErrorsOf(create.error), ...clientErrors };
  const onSubmit = form.handleSubmit((v) => {
    const checked = checkShareLinkForm(v);
    if (!checked.ok) {
      setClientErrors(checked.errors);
      return;
    }
    setClientErrors({});
    create.mutate({ workspaceId: workspace.id, body: checked.body });
  });
  const fieldError = (name: string) =>
    serverErrors[name] && (
      <p id={`link-${name}-error`} className="text-sm text-fail">
        <span aria-hidden="true">✗ </span>
        {serverErrors[name]}
      </p>
    );
  return (
    <section aria-labelledby="links-heading" className="space-y-4">
      <h2 id="links-heading" className="text-lg font-semibold">
        Share links
      </h2>
      <p className="text-graphite-soft">
        Anyone signed in who opens a link joins {workspace.name} with its role. Links never make anyone an
        owner.
      </p>
      <form
        onSubmit={onSubmit}
        noValidate
        className="grid items-start gap-3 rounded border border-rule bg-panel p-4 sm:grid-cols-4"
      >
        <div className="space-y-1">
          <label htmlFor="link-role" className="block text-sm font-semibold">
            Role
          </label>
          <select
            id="link-role"
            className="w-full rounded border border-rule-strong bg-panel px-2 py-2"
            {...form.register("role")}
          >
            {SHARE_LINK_ROLES.map((r) => (
              <option key={r} value={r}>
                {r}
              </option>
            ))}
          </select>
          {fieldError("role")}
        </div>
        <div className="space-y-1">
          <label htmlFor="link-days" className="block text-sm font-semibold">
            Expires after (days)
          </label>
          <input
            id="link-days"
            type="number"
            min={1}
            max={SHARE_LINK_MAX_DAYS}
            className="num w-full rounded border border-rule-strong bg-panel px-2 py-2"
            aria-describedby="link-expiresInDays-error"
            {...form.register("expiresInDays")}
          />
          {fieldError("expiresInDays")}
        </div>
        <div className="space-y-1">
          <label htmlFor="link-uses" className="block text-sm font-semibold">
            Use limit (empty: none)
          </label>
          <input
            id="link-uses"
            type="number"
            min={1}
            className="num w-full rounded border border-rule-strong bg-panel px-2 py-2"
            aria-describedby="link-maxUses-error"
            {...form.register("maxUses")}
          />
          {fieldError("maxUses")}
        </div>
        <div className="space-y-1">
          <label htmlFor="link-label" className="block text-sm font-semibold">
            Label (optional)
          </label>
          <input
            id="link-label"
            className="w-full rounded border border-rule-strong bg-panel px-2 py-2"
            placeholder="Client review"
            {...form.register("label")}
          />
          {fieldError("label")}
        </div>
        <button
          type="submit"
          className={`${primaryButton} sm:col-span-4 sm:justify-self-start`}
          disabled={create.isPending}
        >
          Create link
        </button>
      </form>
      <FormMessage error={Object.keys(serverErrors).length ? null : (create.error ?? revoke.error)} />
      {create.data && (
        <div role="status" className="space-y-2 rounded border border-pass bg-pass-wash p-4">
          <p className="font-semibold">✓ Link created. Copy it now — it is shown only once.</p>
          <div className="flex gap-2">
            <input
              readOnly
              aria-label="New share link"
              value={create.data.url}
              className="num flex-1 rounded border border-rule bg-panel px-2 py-1 text-sm"
            />
            <button
              type="button"
              className={quietButton}
              onClick={() =>
                navigator.clipboard.writeText(create.data.url).then(
                  () => setCopied(true),
                  () => setCopied(false),
                )
              }
            >
              {copied ? "Copied" : "Copy"}
            </button>
          </div>
        </div>
      )}
      {/* On a phone the table scrolls inside its own box, not the page. */}
      <TableScroll label="Share links table">
        <table className="w-full border-collapse text-left">
          <thead className="border-b border-rule text-sm text-graphite-soft">
            <tr>
              <th className="px-4 py-2 font-semibold">Link</th>
              <th className="px-4 py-2 font-semibold">Role</th>
              <th className="px-4 py-2 font-semibold">State</th>
              <th className="px-4 py-2 font-semibold">Uses</th>
              <th className="px-4 py-2 font-semibold">Expires</th>
              <th className="px-4 py-2">
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {links.data?.length === 0 && (
              <tr>
                <td colSpan={6} className="px-4 py-3 text-graphite-soft">
                  No share links yet.
                </td>
              </tr>
            )}
            {links.data?.map((l) => (
              <tr key={l.id} className="border-b border-rule last:border-0">
                <td className="px-4 py-3">
                  {l.label ?? "Untitled link"}
                  <br />
                  <span className="text-sm text-graphite-soft">
                    by {l.createdByName ?? "a former member"} on {formatDate(l.createdAt)}
                  </span>
                </td>
                <td className="px-4 py-3">
                  <RoleBadge role={l.role} />
                </td>
                <td className="px-4 py-3">{SHARE_LINK_STATE_WORDS[l.state]}</td>
                <td className="num px-4 py-3 text-sm">{shareLinkUses(l)}</td>
                <td className="num px-4 py-3 text-sm">{formatDate(l.expiresAt)}</td>
                <td className="px-4 py-3 text-right">
                  {canRevokeShareLink(l.state) && (
                    <button
                      type="button"
                      className={quietButton}
                      onClick={() => revoke.mutate({ workspaceId: workspace.id, linkId: l.id })}
                    >
                      Revoke
                    </button>
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
