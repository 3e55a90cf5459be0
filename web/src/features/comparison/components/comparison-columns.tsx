/**
 * The comparison table's columns for TanStack Table: the model's column specs (model/table-model.ts)
 * with how each cell reads — case with its governing mark and factors, location with its material,
 * stresses with their tone, each criterion's factor against the required one with its verdict, and
 * the link that opens the row in the bench.
 */
import { createColumnHelper, type ColumnDef } from "@tanstack/react-table";
import type { ReactNode } from "react";
import { Link } from "react-router-dom";
import { formatFactor, type ComparisonRowView } from "../../../../../core/contract/comparison";
import type { StressUnitName } from "../../../../../core/contract/materials";
import { CRITERION_LABELS, type CriterionName } from "../../../../../core/contract/projects";
import { Quantity, stressTone } from "../../../components/Quantity";
import { Verdict } from "../../../components/Verdict";
import { benchLinkForCombination, benchLinkForState } from "../../../lib/bench-link";
import { checkOf, type GoverningMarks } from "../model/rows";
import { formatStress } from "../../../lib/stress";
import { benchComponents, matchesEquals, type ColumnSpec } from "../model/table-model";

type Row = ComparisonRowView;
const helper = createColumnHelper<Row>();

/** What the cells need besides the row. */
export type CellContext = {
  unit: StressUnitName;
  workspaceId: string;
  projectId: string;
  marks: ReadonlyMap<string, GoverningMarks>;
};

function CaseCell({ row: r, marks }: { row: Row; marks: GoverningMarks | undefined }) {
  return (
    <div>
      <span className="font-semibold">{r.caseName}</span>
      {r.kind === "combination" && (
        <span className="ml-1.5 rounded-sm bg-paper-deep px-1 text-[11px] text-graphite-soft">
          combination
        </span>
      )}
      {marks && marks.overall.length > 0 && (
        <div className="text-[12px] font-semibold text-ink">
          <span aria-hidden="true">◆ </span>governs {marks.overall.map((c) => CRITERION_LABELS[c]).join(", ")}
        </div>
      )}
      {marks && marks.atLocation.length > 0 && marks.overall.length === 0 && (
        <div className="text-[12px] text-ink">
          <span aria-hidden="true">◇ </span>governs here:{" "}
          {marks.atLocation.map((c) => CRITERION_LABELS[c]).join(", ")}
        </div>
      )}
      <div className="text-[12px] text-graphite-soft" data-testid="allowable">
        {r.category && r.kind === "load-case" ? `${r.category} · ` : ""}factors: {r.allowable.label}
      </div>
    </div>
  );
}

function CheckCell({ row, criterion }: { row: Row; criterion: CriterionName }) {
  const check = checkOf(row, criterion);
  if (!check) return null;
  if (check.status === "not-evaluated") {
    return (
      <span className="text-[12px] text-graphite-soft" title={check.reason}>
        not evaluated: {check.missing.length > 0 ? `needs ${check.missing.join(", ")}` : check.reason}
      </span>
    );
  }
  if (check.status === "not-applicable") {
    return (
      <span className="text-[12px] text-graphite-soft" title={check.reason}>
        not applicable to this material
      </span>
    );
  }
  return (
    <span className="inline-flex items-center gap-2 whitespace-nowrap">
      <span className="num">{formatFactor(check.factor)}</span>
      <span
        className="unit text-[12px]"
        title={`required: ${check.category === null ? "project default" : `“${check.category}” factor`}`}
      >
        / {check.requiredFactor}
        {check.category !== null && <sup className="ml-0.5">{check.category}</sup>}
      </span>
      <span className="num text-[12px] text-graphite-soft">u {check.utilisation.toFixed(2)}</span>
      <Verdict state={check.verdict} />
      {check.unsuited && (
        <span className="text-[11px] text-close" title={check.unsuited}>
          unsuited, rated on request
        </span>
      )}
    </span>
  );
}

function BenchCell({ row: r, ctx }: { row: Row; ctx: CellContext }) {
  const values = benchComponents(r, ctx.unit);
  const to =
    r.kind === "load-case"
      ? benchLinkForState(
          {
            workspaceId: ctx.workspaceId,
            projectId: ctx.projectId,
            loadCaseId: r.caseId,
            locationId: r.locationId,
          },
          values,
          ctx.unit,
        )
      : // The bench says the superposed state is view-only and a superposition, and checks it
        // with the project's default factors and the location's material, as this row is.
        benchLinkForCombination(
          r.caseName,
          { workspaceId: ctx.workspaceId, projectId: ctx.projectId, locationId: r.locationId },
          values,
          ctx.unit,
        );
  return (
    <Link to={to} className="whitespace-nowrap text-[13px] text-ink underline-offset-2 hover:underline">
      Open in bench
      {/* The name starts with the visible words (WCAG 2.5.3), then says which row it opens. */}
      <span className="sr-only">
        : {r.caseName} at {r.locationName}
      </span>
    </Link>
  );
}

/** How one column's cell reads. */
function cellOf(spec: ColumnSpec, row: Row, ctx: CellContext): ReactNode {
  switch (spec.id) {
    case "caseName":
      return <CaseCell row={row} marks={ctx.marks.get(row.rowId)} />;
    case "locationId":
      return (
        <div>
          {row.locationName}
          <div className="text-[12px] text-graphite-soft">{row.material.label}</div>
        </div>
      );
    case "s1":
    case "s2":
    case "s3": {
      const pa = spec.value!(row) as number;
      return (
        <Quantity
          value={formatStress(pa, ctx.unit)}
          tone={stressTone(pa, Math.max(...row.principalPa.map(Math.abs)))}
        />
      );
    }
    case "vonMisesPa":
    case "trescaPa":
    case "maxShearPa":
      return <Quantity value={formatStress(spec.value!(row) as number, ctx.unit)} />;
    case "bench":
      return <BenchCell row={row} ctx={ctx} />;
    default:
      return spec.criterion ? <CheckCell row={row} criterion={spec.criterion} /> : null;
  }
}

/** TanStack column definitions for the model's specs. */
export function tableColumns(specs: readonly ColumnSpec[], ctx: CellContext): ColumnDef<Row, unknown>[] {
  return specs.map((spec) => {
    const cell = (info: { row: { original: Row } }) => cellOf(spec, info.row.original, ctx);
    if (!spec.value) return helper.display({ id: spec.id, header: spec.header, cell });
    const compare = spec.compare;
    return helper.accessor(spec.value, {
      id: spec.id,
      header: spec.header,
      cell,
      meta: spec.numeric ? { numeric: true } : undefined,
      // Only set when the model says so: an undefined key would replace TanStack's "auto" default.
      ...(spec.filter && {
        filterFn: (row: { original: Row }, _id: string, wanted: string | undefined) =>
          matchesEquals(spec, row.original, wanted),
      }),
      ...(compare && {
        sortingFn: (a: { original: Row }, b: { original: Row }) => compare(a.original, b.original),
      }),
    }) as ColumnDef<Row, unknown>;
  });
}
