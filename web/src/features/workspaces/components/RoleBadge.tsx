import type { Role } from "../../../../../core/contract/workspaces";

/** A role in words (never colour alone). */
export function RoleBadge({ role }: { role: Role }) {
  return (
    <span className="rounded border border-rule-strong bg-paper px-2 py-0.5 text-sm font-semibold text-graphite">
      {role}
    </span>
  );
}
