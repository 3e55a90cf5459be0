import { useId } from "react";
import { Caution } from "../../../components/Caution";
import { NumberField } from "../../../components/NumberField";
import { Panel } from "../../../components/Panel";
import { Quantity } from "../../../components/Quantity";
import { Verdict } from "../../../components/Verdict";
import { ToolButton } from "../../../components/ToolButton";
import {
  CLOSE_BAND,
  FROM_MEMORY_NOTE,
  PUBLISHED_MATERIALS,
  convertStress,
  materialBehaviour,
  publishedMaterial,
} from "../../../../../core";
import { useCriteria } from "../hooks/use-derived";
import type { BehaviourChoice } from "../model/bench-state";
import { CRITERION_LABEL, governing, materialForCore } from "../model/derive";
import { decimalsFor, editable, factor, fixed } from "../model/format";
import { useBenchStore } from "../model/store";
import { useOutOfDate } from "../hooks/use-out-of-date";

// Long because the panel's rows, its material and required-factor controls and the source line
// of a project's factors read the same store values; the results come from model/derive.ts.

/** Panel 5: the verdict that matters — every criterion against the material and the required factor. */
export function CriteriaPanel() {
  const outOfDate = useOutOfDate();
  const unit = useBenchStore((s) => s.unit);
  const material = useBenchStore((s) => s.material);
  const required = useBenchStore((s) => s.requiredFactor);
  const project = useBenchStore((s) => s.projectRequirements);
  const behaviour = useBenchStore((s) => s.behaviour);
  const includeUnsuited = useBenchStore((s) => s.includeUnsuited);
  const act = useBenchStore((s) => s.act);
  const results = useCriteria();
  // Criteria that do not suit the material share one line (same reason), to keep the panel short.
  const unsuitedRows = results.filter((r) => !r.available && r.kind === "not-applicable");
  // So do those the project does not check.
  const uncheckedRows = results.filter((r) => !r.available && r.kind === "not-checked");
  const shownRows = results.filter(
    (r) => r.available || (r.kind !== "not-applicable" && r.kind !== "not-checked"),
  );
  const found = materialBehaviour(materialForCore(material, behaviour));
  const behaviourId = useId();
  const preset = material.presetId ? publishedMaterial(material.presetId) : null;
  const gov = governing(results);
  const selectId = useId();
  const noteId = useId();
  const shown = (mpa: number | null) => (mpa === null ? null : convertStress(mpa, "MPa", unit));
  const d = decimalsFor(
    Math.max(
      ...results.map((r) => (r.available && Number.isFinite(r.equivalent) ? Math.abs(r.equivalent) : 0)),
    ),
  );
  return (
    <Panel
      outOfDate={outOfDate}
      id="criteria"
      index="6"
      title="Criteria"
      subtitle={`against the material, ${unit}`}
      bodyClassName="flex flex-col gap-2 px-3 py-2"
    >
      <div className="flex items-center gap-1.5 text-[13px]">
        <label htmlFor={selectId} className="shrink-0 text-[12px] text-graphite-soft">
          Material
        </label>
        <select
          id={selectId}
          value={material.presetId ?? ""}
          aria-describedby={noteId}
          onChange={(e) => e.target.value && act.choosePublishedMaterial(e.target.value)}
          className="min-w-0 flex-1 rounded-sm border border-rule bg-white px-1 py-0.5"
        >
          <option value="">Typed in (custom strengths)</option>
          <optgroup label="Published minimum values">
            {PUBLISHED_MATERIALS.map((m) => (
              <option key={m.id} value={m.id}>
                {m.standard} {m.name}
              </option>
            ))}
          </optgroup>
        </select>
        <select
          id={behaviourId}
          aria-label="Ductile or brittle"
          title="Which criteria suit the material: yield criteria for a ductile one, fracture criteria for a brittle one"
          value={behaviour}
          onChange={(e) => act.setBehaviour(e.target.value as BehaviourChoice)}
          className="w-28 shrink-0 rounded-sm border border-rule bg-white px-1 py-0.5 text-[12px]"
        >
          <option value="from-data">{found.behaviour} (data)</option>
          <option value="ductile">ductile</option>
          <option value="brittle">brittle</option>
        </select>
        {!project && (
          <>
            <span className="shrink-0 text-[12px] text-graphite-soft" aria-hidden="true">
              required n
            </span>
            <NumberField
              label="required safety factor n"
              hideLabel
              value={required}
              format={(v) => String(v)}
              min={1}
              className="w-12 shrink-0"
              onCommit={(v) => v !== null && act.setRequiredFactor(v)}
            />
          </>
        )}
      </div>
      {project && (
        <div
          className="flex flex-wrap items-center gap-x-2 text-[12px] leading-4 text-graphite-soft"
          data-testid="requirements-source"
        >
          <span>
            Required factors from <span className="text-graphite">{project.source}</span>:{" "}
            {project.requirements
              .map((r) => `${CRITERION_LABEL[r.criterion]} n ≥ ${r.requiredFactor}`)
              .join(", ")}
            .
          </span>
          <ToolButton onClick={() => act.setProjectRequirements(null)}>
            Use one factor here instead
          </ToolButton>
        </div>
      )}
      <div className="grid grid-cols-3 gap-1.5 text-[13px]">
        {(
          [
            ["yield", "Sy", "yield strength Sy"],
            ["ultimateTension", "Sut", "tensile strength Sut"],
            ["ultimateCompression", "Suc", "compressive strength Suc"],
          ] as const
        ).map(([key, short, long]) => (
          <div key={key} className="flex items-center gap-1">
            <span className="text-[12px] text-graphite-soft" aria-hidden="true">
              {short}
            </span>
            <NumberField
              label={long}
              hideLabel
              value={shown(material[key])}
              format={editable}
              unit={unit}
              className="min-w-0 flex-1"
              onCommit={(v) => act.setStrength(key, v)}
            />
          </div>
        ))}
      </div>
      <p id={noteId} className="text-[12px] leading-4 text-graphite-soft">
        {preset ? (
          <>
            <span title={`Suc ${preset.compressionBasis}`}>
              {preset.standard} {preset.name}, {preset.scope}.
            </span>{" "}
            <span className="text-close">Values {FROM_MEMORY_NOTE}.</span>
          </>
        ) : (
          "Strengths as typed (Sy yield, Sut tensile, Suc compressive). A criterion that needs a blank one says so."
        )}
      </p>
      <table className="w-full text-[13px]" data-testid="criteria-table">
        <thead>
          <tr className="border-b border-rule text-[12px] text-graphite-soft">
            <th scope="col" className="py-0.5 text-left font-normal">
              Criterion
            </th>
            <th scope="col" className="text-right font-normal">
              Equivalent stress σ<sub>eq</sub>, {unit}
            </th>
            <th scope="col" className="text-right font-normal">
              Safety factor n
            </th>
            <th scope="col" className="text-right font-normal">
              Required n
            </th>
            <th scope="col" className="text-right font-normal">
              Utilisation u
            </th>
            <th scope="col" className="pl-3 text-left font-normal">
              Verdict
            </th>
          </tr>
        </thead>
        <tbody>
          {shownRows.map((r) => (
            <tr
              key={r.criterion}
              className={`border-b border-rule/60 ${gov?.criterion === r.criterion ? "bg-paper/60" : ""}`}
              data-testid={`criterion-${r.criterion}`}
            >
              <th scope="row" className="py-[2px] text-left font-normal">
                {CRITERION_LABEL[r.criterion]}
                {gov?.criterion === r.criterion && (
                  <span className="ml-1 text-[11px] text-graphite-soft">governs</span>
                )}
              </th>
              {r.available ? (
                <>
                  <td className="text-right">
                    <Quantity value={fixed(r.equivalent, d)} unit={unit} />
                    <span className="ml-1 text-[11px] text-graphite-faint">vs {r.reference}</span>
                  </td>
                  <td className="num text-right" data-testid="n">
                    {factor(r.n)}
                  </td>
                  <td
                    className="num text-right"
                    data-testid="required"
                    title={
                      r.category === null
                        ? "project default or the bench's factor"
                        : `the “${r.category}” factor`
                    }
                  >
                    {r.requiredFactor}
                  </td>
                  <td className="num text-right">
                    {Number.isFinite(r.n) ? `${(r.utilisation * 100).toFixed(0)} %` : "0 %"}
                  </td>
                  <td className="pl-3">
                    <Verdict state={r.verdict} />
                    {r.unsuited && (
                      <span className="ml-1 text-[11px] text-close" title={r.unsuited}>
                        unsuited
                      </span>
                    )}
                  </td>
                </>
              ) : (
                <td
                  colSpan={5}
                  className="text-[12px] text-graphite-soft"
                  data-testid="not-rated"
                  title={r.reason}
                >
                  — {r.brief}
                </td>
              )}
            </tr>
          ))}
          {uncheckedRows.length > 0 && (
            <tr className="border-b border-rule/60" data-testid="criteria-not-checked">
              <td colSpan={6} className="py-[2px] text-[12px] text-graphite-soft">
                {uncheckedRows.map((r) => CRITERION_LABEL[r.criterion]).join(", ")}: not checked by this
                project
              </td>
            </tr>
          )}
          {unsuitedRows.length > 0 && (
            <tr className="border-b border-rule/60" data-testid="criteria-not-applicable">
              <td
                colSpan={6}
                className="py-[2px] text-[12px] text-graphite-soft"
                title={unsuitedRows[0].available ? undefined : unsuitedRows[0].reason}
              >
                {unsuitedRows.map((r) => CRITERION_LABEL[r.criterion]).join(", ")}:{" "}
                {unsuitedRows[0].available ? "" : unsuitedRows[0].brief}
                <label className="ml-2 inline-flex items-center gap-1">
                  <input
                    type="checkbox"
                    checked={includeUnsuited}
                    onChange={(e) => act.setIncludeUnsuited(e.target.checked)}
                  />
                  rate them too
                </label>
              </td>
            </tr>
          )}
          {includeUnsuited && (
            <tr className="border-b border-rule/60">
              <td colSpan={6} className="py-[2px] text-[12px] text-graphite-soft">
                Criteria that do not suit the material are rated on request and can govern.
                <label className="ml-2 inline-flex items-center gap-1">
                  <input
                    type="checkbox"
                    checked={includeUnsuited}
                    onChange={(e) => act.setIncludeUnsuited(e.target.checked)}
                  />
                  rate them
                </label>
              </td>
            </tr>
          )}
        </tbody>
      </table>
      <p
        className="text-[12px] leading-4 text-graphite-soft"
        data-testid="tresca-definitions"
        title="n is the factor the whole state may grow by before the criterion is reached; utilisation = required n ÷ n; the criterion with the highest utilisation governs. Practitioners call either Tresca form by that name."
      >
        <span className="text-pass">✓ passes</span> n ≥ 1.1 × required ·{" "}
        <span className="text-close">≈ close</span> within {(CLOSE_BAND * 100).toFixed(0)} % above ·{" "}
        <span className="text-fail">✗ fails</span> below. Tresca: σ₁ − σ₃ vs Sy, i.e. τmax = (σ₁ − σ₃)/2 vs
        Sy/2.
      </p>
      <Caution className="!text-[12px] leading-4" />
    </Panel>
  );
}
