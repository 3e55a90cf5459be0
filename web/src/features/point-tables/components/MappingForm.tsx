import { STRESS_UNIT_NAMES, type StressUnitName } from "../../../../../core/contract/materials";
import { COMPONENT_SYMBOLS } from "../../../lib/stress";
import {
  COLUMN_ROLES,
  assignColumn,
  type ColumnRole,
  type MappingDraft,
  type MappingIssue,
  type Preview,
} from "../model/column-mapping";

const ROLE_LABELS: Record<ColumnRole, string> = {
  xx: COMPONENT_SYMBOLS.xx.tensor,
  yy: COMPONENT_SYMBOLS.yy.tensor,
  zz: COMPONENT_SYMBOLS.zz.tensor,
  xy: COMPONENT_SYMBOLS.xy.tensor,
  yz: COMPONENT_SYMBOLS.yz.tensor,
  zx: COMPONENT_SYMBOLS.zx.tensor,
  id: "point id",
  x: "x",
  y: "y",
  z: "z",
};
const SEPARATORS: { value: MappingDraft["separator"]; label: string }[] = [
  { value: ",", label: "comma" },
  { value: ";", label: "semicolon" },
  { value: "\t", label: "tab" },
  { value: "whitespace", label: "spaces" },
];
const select = "rounded border border-rule-strong bg-panel px-2 py-1 text-sm";

/** The role a column has in the draft, or "" when none. */
const roleOf = (draft: MappingDraft, col: number) => COLUMN_ROLES.find((r) => draft.columns[r] === col) ?? "";

/**
 * The layout of the text and a role per column over the first rows: the engineer checks the
 * guess against the numbers and corrects it.
 */
export function MappingForm({
  draft,
  preview,
  issues,
  onChange,
}: {
  draft: MappingDraft;
  preview: Preview;
  issues: MappingIssue[];
  onChange: (d: MappingDraft) => void;
}) {
  const issueOf = (field: string) => issues.find((i) => i.field === field)?.message;
  const columns = Array.from({ length: preview.fieldCount }, (_, i) => i);
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end gap-3 text-sm">
        <label className="space-y-1">
          <span className="block font-semibold">Separator</span>
          <select
            className={select}
            value={draft.separator}
            onChange={(e) => onChange({ ...draft, separator: e.target.value as MappingDraft["separator"] })}
          >
            {SEPARATORS.map((s) => (
              <option key={s.label} value={s.value}>
                {s.label}
              </option>
            ))}
          </select>
        </label>
        <label className="space-y-1">
          <span className="block font-semibold">Decimal mark</span>
          <select
            className={select}
            value={draft.decimal}
            aria-invalid={issueOf("decimal") ? true : undefined}
            onChange={(e) => onChange({ ...draft, decimal: e.target.value as MappingDraft["decimal"] })}
          >
            <option value=".">point 12.5</option>
            <option value=",">comma 12,5</option>
          </select>
        </label>
        <label className="space-y-1">
          <span className="block font-semibold">Rows to skip</span>
          <input
            type="number"
            min={0}
            max={1000}
            className={`${select} num w-20`}
            value={Number.isFinite(draft.skipRows) ? draft.skipRows : ""}
            aria-invalid={issueOf("skipRows") ? true : undefined}
            onChange={(e) =>
              onChange({ ...draft, skipRows: e.target.value === "" ? 0 : Number(e.target.value) })
            }
          />
        </label>
        <label className="flex items-center gap-1.5 pb-1">
          <input
            type="checkbox"
            checked={draft.header}
            onChange={(e) => onChange({ ...draft, header: e.target.checked })}
          />
          first row names the columns
        </label>
        <label className="space-y-1">
          <span className="block font-semibold">Stress unit</span>
          <select
            className={select}
            value={draft.unit}
            onChange={(e) => onChange({ ...draft, unit: e.target.value as StressUnitName })}
          >
            {STRESS_UNIT_NAMES.map((u) => (
              <option key={u}>{u}</option>
            ))}
          </select>
        </label>
        <label className="space-y-1">
          <span className="block font-semibold">Point ids are</span>
          <select
            className={select}
            value={draft.idKind}
            onChange={(e) => onChange({ ...draft, idKind: e.target.value as MappingDraft["idKind"] })}
          >
            <option value="number">numbers</option>
            <option value="text">text</option>
          </select>
        </label>
      </div>
      <div
        className="overflow-x-auto rounded border border-rule"
        role="region"
        aria-label="First rows of the table"
        tabIndex={0}
      >
        <table className="border-collapse text-[13px]">
          <thead>
            <tr className="border-b border-rule">
              {columns.map((col) => (
                <th key={col} scope="col" className="px-2 py-1 text-left font-normal">
                  <label className="block text-[12px] text-graphite-soft">
                    column {col + 1}
                    {preview.names?.[col] ? `: ${preview.names[col]}` : ""}
                    <select
                      aria-label={`Role of column ${col + 1}`}
                      className={`${select} mt-0.5 block w-full`}
                      value={roleOf(draft, col)}
                      onChange={(e) =>
                        onChange(
                          e.target.value === ""
                            ? assignColumn(draft, roleOf(draft, col) as ColumnRole, null)
                            : assignColumn(draft, e.target.value as ColumnRole, col),
                        )
                      }
                    >
                      <option value="">ignored</option>
                      {COLUMN_ROLES.map((r) => (
                        <option key={r} value={r}>
                          {ROLE_LABELS[r]}
                        </option>
                      ))}
                    </select>
                  </label>
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {preview.rows.map((row, i) => (
              <tr key={i} className="border-b border-rule last:border-0">
                {columns.map((col) => (
                  <td key={col} className="num whitespace-nowrap px-2 py-0.5 text-right">
                    {row[col] ?? ""}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {issues.length > 0 && (
        <ul className="space-y-0.5 text-sm text-fail" data-testid="mapping-issues">
          {issues.map((i) => (
            <li key={i.field}>
              <span aria-hidden="true">✗ </span>
              {i.message}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
