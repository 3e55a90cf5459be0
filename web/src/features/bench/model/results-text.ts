/**
 * "Copy results as text": a plain, aligned block an engineer can paste into a report. Every value
 * here comes from the same derived results the screen shows.
 */
import { publishedMaterial, type StressTensor } from "../../../../../core";
import { RESULTS_CAUTION } from "../../../../../core/contract/cautions";
import type { BenchState } from "./bench-state";
import {
  CRITERION_LABEL,
  criteriaOf,
  governing,
  rotatedView,
  rotationDescription,
  stateSummary,
} from "./derive";
import { decimalsFor, factor, fixed } from "./format";

const VERDICT_WORD = { pass: "passes", close: "close", fail: "FAILS" } as const;

function pad(text: string, width: number): string {
  return text.length >= width ? text : " ".repeat(width - text.length) + text;
}

function rows(label: string, values: string[], unit: string, width: number): string {
  return `${label.padEnd(10)}${values.map((v) => pad(v, width)).join("")}  ${unit}`;
}

function tensorBlock(title: string, s: StressTensor, unit: string): string[] {
  const d = decimalsFor(Math.max(...Object.values(s).map(Math.abs)));
  const f = (v: number) => fixed(v, d);
  const w = Math.max(...Object.values(s).map((v) => f(v).length)) + 3;
  return [
    title,
    rows("", [f(s.xx), f(s.xy), f(s.zx)], unit, w),
    rows("", [f(s.xy), f(s.yy), f(s.yz)], unit, w),
    rows("", [f(s.zx), f(s.yz), f(s.zz)], unit, w),
  ];
}

/** The bench's results as plain text (ASCII layout, Unicode symbols). */
export function resultsAsText(state: BenchState, link?: string): string {
  const u = state.unit;
  const summary = stateSummary(state.tensor);
  const { rotated } = rotatedView(state.tensor, state.rotation);
  const rot = rotationDescription(state.rotation, state.eulerSequence);
  const [s1, s2, s3] = summary.principal.values;
  const d = decimalsFor(Math.max(Math.abs(s1), Math.abs(s3)));
  const f = (v: number) => fixed(v, d);
  const line = (label: string, value: string, unit = u) => `${label.padEnd(26)}${pad(value, 12)}  ${unit}`;
  const preset = state.material.presetId ? publishedMaterial(state.material.presetId) : null;
  const out: string[] = [
    "Sigmacube — stress state check",
    "",
    ...tensorBlock("Stress tensor σ in x y z (tension positive)", state.tensor, u),
    "",
    line("σ₁", f(s1)),
    line("σ₂", f(s2)),
    line("σ₃", f(s3)),
    line("Tresca σ₁ − σ₃", f(summary.tresca)),
    line("τₘₐₓ = (σ₁ − σ₃)/2", f(summary.tauMax)),
    line("σ_vM (von Mises)", f(summary.vonMises)),
    "",
    `Element frame x′ y′ z′: axis (${rot.axisAngle.axis.map((v) => fixed(v, 4)).join(", ")}), angle ${fixed(rot.axisAngle.angleDeg, 2)}°; ` +
      `${state.eulerSequence} intrinsic ${rot.euler.map((v) => fixed(v, 2) + "°").join(" ")}`,
    ...tensorBlock("σ′ = R σ Rᵀ in x′ y′ z′", rotated, u),
    "",
    `Material: ${preset ? `${preset.standard} ${preset.name} (${preset.scope}), values ${preset.note}` : "strengths typed in"}`,
    state.projectRequirements
      ? `Required safety factors from ${state.projectRequirements.source}`
      : `Required safety factor: ${factor(state.requiredFactor)} for every criterion`,
    `${"Criterion".padEnd(20)}${pad("σ_eq", 12)}      ${pad("n", 8)}${pad("required", 10)}${pad("utilisation", 13)}  verdict`,
  ];
  const results = criteriaOf(state);
  for (const r of results) {
    if (!r.available) {
      out.push(`${CRITERION_LABEL[r.criterion].padEnd(20)}${r.reason}`);
      continue;
    }
    out.push(
      `${CRITERION_LABEL[r.criterion].padEnd(20)}${pad(f(r.equivalent), 12)} ${u.padEnd(5)}${pad(factor(r.n), 8)}${pad(String(r.requiredFactor), 10)}${pad(`${(r.utilisation * 100).toFixed(0)} %`, 13)}  ${VERDICT_WORD[r.verdict]}${r.unsuited ? " (unsuited to the material, rated on request)" : ""}`,
    );
  }
  const top = governing(results);
  out.push(
    top
      ? `Governs: ${CRITERION_LABEL[top.criterion]} (highest utilisation, ${(top.utilisation * 100).toFixed(0)} %)`
      : "Governs: nothing could be rated",
    "Tresca is given both ways: the equivalent stress σ₁ − σ₃ (against Sy) and the maximum shear (σ₁ − σ₃)/2 (against Sy/2).",
  );
  out.push("", `Caution: ${RESULTS_CAUTION}`);
  if (link) out.push(`Link: ${link}`);
  return out.join("\n");
}
