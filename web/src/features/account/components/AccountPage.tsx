import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { useNavigate } from "react-router-dom";
import {
  changePasswordBodySchema,
  updateAccountBodySchema,
  type ChangePasswordBody,
  type UpdateAccountBody,
} from "../../../../../core/contract/account";
import { PASSWORD_MIN_LENGTH } from "../../../../../core/contract/auth";
import { applyServerErrors, Field, FormMessage, primaryButton, quietButton } from "../../../lib/forms";
import { useSession } from "../../../lib/session";
import { useChangePassword } from "../api/change-password";
import { useSignOutEverywhere } from "../api/sign-out-everywhere";
import { useUpdateAccount } from "../api/update-account";

/** `/account`: name, password, and signing out of every device. */
export function AccountPage() {
  const user = useSession().data?.user;
  if (!user) return null;
  return (
    <div className="mx-auto max-w-2xl space-y-8">
      <header>
        <h1 className="text-2xl font-semibold tracking-tight">Account</h1>
        <p className="mt-1 text-graphite-soft">
          Signed in as <strong>{user.email}</strong>
        </p>
      </header>
      <NameForm name={user.name} />
      <PasswordForm />
      <SignOutEverywhere />
    </div>
  );
}

function Panel({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <section className="rounded border border-rule bg-panel p-6" aria-labelledby={`${title}-heading`}>
      <h2 id={`${title}-heading`} className="mb-4 border-b border-rule pb-2 text-lg font-semibold">
        {title}
      </h2>
      {children}
    </section>
  );
}

function NameForm({ name }: { name: string }) {
  const update = useUpdateAccount();
  const form = useForm<UpdateAccountBody>({
    resolver: zodResolver(updateAccountBodySchema),
    defaultValues: { name },
  });
  const onSubmit = form.handleSubmit((body) =>
    update.mutate(body, { onError: (error) => applyServerErrors(error, form.setError, ["name"]) }),
  );
  return (
    <Panel title="Name">
      <form onSubmit={onSubmit} noValidate className="flex items-end gap-3">
        <div className="flex-1">
          <Field
            id="account-name"
            label="Name your team sees"
            error={form.formState.errors.name?.message}
            {...form.register("name")}
          />
        </div>
        <button type="submit" className={primaryButton} disabled={update.isPending}>
          Save
        </button>
      </form>
      {update.isSuccess && (
        <p role="status" className="mt-2 text-sm text-pass">
          ✓ Saved.
        </p>
      )}
    </Panel>
  );
}

function PasswordForm() {
  const change = useChangePassword();
  const form = useForm<ChangePasswordBody>({
    resolver: zodResolver(changePasswordBodySchema),
    defaultValues: { currentPassword: "", newPassword: "" },
  });
  const onSubmit = form.handleSubmit((body) =>
    change.mutate(body, {
      onSuccess: () => form.reset(),
      onError: (error) => applyServerErrors(error, form.setError, ["currentPassword", "newPassword"]),
    }),
  );
  const { errors } = form.formState;
  return (
    <Panel title="Password">
      <form onSubmit={onSubmit} noValidate className="space-y-4">
        <Field
          id="current-password"
          label="Current password"
          type="password"
          autoComplete="current-password"
          error={errors.currentPassword?.message}
          {...form.register("currentPassword")}
        />
        <Field
          id="new-password"
          label="New password"
          type="password"
          autoComplete="new-password"
          hint={`At least ${PASSWORD_MIN_LENGTH} characters. Your other devices are signed out.`}
          error={errors.newPassword?.message}
          {...form.register("newPassword")}
        />
        <button type="submit" className={primaryButton} disabled={change.isPending}>
          Change password
        </button>
        {change.isSuccess && (
          <p role="status" className="text-sm text-pass">
            ✓ Password changed; other devices were signed out.
          </p>
        )}
      </form>
    </Panel>
  );
}

function SignOutEverywhere() {
  const everywhere = useSignOutEverywhere();
  const navigate = useNavigate();
  return (
    <Panel title="Devices">
      <p className="mb-3 text-graphite-soft">
        Lost a laptop or signed in on a shared computer? End every session at once, this one included.
      </p>
      <button
        type="button"
        className={quietButton}
        onClick={() => everywhere.mutate(undefined, { onSuccess: () => navigate("/sign-in") })}
      >
        Sign out of all devices
      </button>
      <FormMessage error={everywhere.error} />
    </Panel>
  );
}
