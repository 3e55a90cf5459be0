import type { ChangeEvent, ReactNode } from "react";
import { STRESS_UNIT_NAMES } from "../../../../../core/contract/materials";
import { LENGTH_UNITS } from "../../../../../core/contract/linearizations";
import { classificationExplained, type LineForm } from "../model/line-form";
import type { ParsedPath } from "../model/path-text";
import { VectorField } from "./VectorField";

type Set = <K extends keyof LineForm>(key: K, value: LineForm[K]) => void;
type Errors = Record<string, string | undefined>;

const input = "w-full rounded border border-rule-strong bg-panel px-2 py-1 text-[15px]";
const label = "block text-sm font-semibold text-graphite";

function Problem({ id, text }: { id: string; text?: string }) {
  if (!text) return null;
  return (
    <p id={id} className="text-sm text-fail">
      <span aria-hidden="true">✗ </span>
      {text}
    </p>
  );
}

function Choice<T extends string>({
  legend,
  name,
  value,
  options,
  onChange,
  children,
}: {
  legend: string;
  name: string;
  value: T;
  options: readonly { value: T; label: string }[];
  onChange: (v: T) => void;
  children?: ReactNode;
}) {
  return (
    <fieldset className="space-y-1">
      <legend className={label}>{legend}</legend>
      <div className="flex flex-wrap gap-x-4 gap-y-1">
        {options.map((o) => (
          <label key={o.value} className="inline-flex items-center gap-1.5 text-[15px]">
            <input type="radio" name={name} checked={value === o.value} onChange={() => onChange(o.value)} />
            {o.label}
          </label>
        ))}
      </div>
      {children}
    </fieldset>
  );
}

/** The path: pasted or uploaded text, what was read from it, the units and the frame. */
export function PathFields({
  form,
  set,
  parsed,
  errors,
}: {
  form: LineForm;
  set: Set;
  parsed: ParsedPath;
  errors: Errors;
}) {
  const upload = (e: ChangeEvent<HTMLInputElement>) => {
    const file = e.target.files?.[0];
    if (file) void file.text().then((text) => set("pathText", text));
  };
  return (
    <div className="space-y-3 p-3">
      <div className="space-y-1">
        <label htmlFor="path-text" className={label}>
          Points from one surface to the other
        </label>
        <textarea
          id="path-text"
          rows={8}
          spellCheck={false}
          className={`${input} num text-[13px]`}
          placeholder={"d  sxx  syy  szz  sxy  syz  szx\n0  -1.2  212  48  0  0  3.1\n…"}
          value={form.pathText}
          onChange={(e) => set("pathText", e.target.value)}
          aria-describedby="path-text-read"
        />
        <div className="flex flex-wrap items-center gap-3 text-sm">
          <label className="inline-flex items-center gap-2">
            or upload a text file
            <input
              type="file"
              accept=".txt,.csv,.tsv,.dat,text/plain"
              onChange={upload}
              className="text-sm"
            />
          </label>
        </div>
        <p id="path-text-read" className="text-[13px] text-graphite-soft" data-testid="path-read">
          {form.pathText.trim() === ""
            ? "One point per line: a distance and the six components (7 values), x y z and the six (9 values), or a header naming the columns (d or x y z; sxx syy szz sxy syz szx)."
            : parsed.ok
              ? `Read ${parsed.points.length} points placed by ${parsed.positions === "distance" ? "distance along the line" : "x y z coordinates"} (${parsed.columns}).${parsed.unitInHeader && parsed.unitInHeader !== form.stressUnit ? ` The header names ${parsed.unitInHeader}; the unit below is ${form.stressUnit}.` : ""}`
              : ""}
        </p>
        <Problem id="path-text-error" text={parsed.ok ? errors.path : parsed.message} />
      </div>
      <div className="grid gap-3 sm:grid-cols-2">
        <div className="space-y-1">
          <label htmlFor="stress-unit" className={label}>
            Stress unit of the components and allowables
          </label>
          <select
            id="stress-unit"
            className={input}
            value={form.stressUnit}
            onChange={(e) => set("stressUnit", e.target.value as LineForm["stressUnit"])}
          >
            {STRESS_UNIT_NAMES.map((u) => (
              <option key={u}>{u}</option>
            ))}
          </select>
        </div>
        <div className="space-y-1">
          <label htmlFor="length-unit" className={label}>
            Length unit of the positions
          </label>
          <select
            id="length-unit"
            className={input}
            value={form.lengthUnit}
            onChange={(e) => set("lengthUnit", e.target.value as LineForm["lengthUnit"])}
          >
            {LENGTH_UNITS.map((u) => (
              <option key={u}>{u}</option>
            ))}
          </select>
        </div>
      </div>
      <div className="grid gap-3 sm:grid-cols-2">
        {(!parsed.ok || parsed.positions === "distance") && (
          <VectorField
            id="line-direction"
            legend="Line direction (through the thickness)"
            value={form.lineDirection}
            onChange={(v) => set("lineDirection", v)}
            error={errors.lineDirection}
            hint="In the stresses' frame, from the first point to the last. Used only when points are placed by distance."
          />
        )}
        <VectorField
          id="second-axis"
          legend="Second local axis (e.g. hoop)"
          value={form.secondAxis}
          onChange={(v) => set("secondAxis", v)}
          error={errors.secondAxis}
          hint="In the stresses' frame; its part along the line is removed. Leave blank for the default the results state."
        />
      </div>
    </div>
  );
}

/** Classification, allowables, equivalent stress and the bending option. */
export function CheckFields({
  form,
  set,
  errors,
  locationHasMaterialNote,
}: {
  form: LineForm;
  set: Set;
  errors: Errors;
  locationHasMaterialNote: string;
}) {
  const number = (key: "S" | "Sy" | "Su", text: string, hint?: string) => (
    <div className="space-y-1">
      <label htmlFor={`allowable-${key}`} className={label}>
        {text} <span className="font-normal text-graphite-soft">({form.stressUnit})</span>
      </label>
      <input
        id={`allowable-${key}`}
        inputMode="decimal"
        className={`${input} num`}
        value={form[key]}
        onChange={(e) => set(key, e.target.value)}
        aria-invalid={errors[key] ? true : undefined}
        aria-describedby={errors[key] ? `allowable-${key}-error` : undefined}
      />
      {hint && <p className="text-[13px] text-graphite-soft">{hint}</p>}
      <Problem id={`allowable-${key}-error`} text={errors[key] ?? errors[`allowables.${key}`]} />
    </div>
  );
  return (
    <div className="space-y-4 p-3">
      <Choice
        legend="Membrane"
        name="membrane"
        value={form.membrane}
        options={[
          { value: "general", label: "general (away from discontinuities)" },
          { value: "local", label: "local (near a discontinuity)" },
        ]}
        onChange={(v) => set("membrane", v)}
      />
      <Choice
        legend="Stresses along the line come from"
        name="stresses"
        value={form.stresses}
        options={[
          { value: "primary", label: "primary loads only" },
          { value: "primary-plus-secondary", label: "primary + secondary" },
        ]}
        onChange={(v) => set("stresses", v)}
      >
        <p className="text-[13px] text-graphite-soft" data-testid="classification-explained">
          {classificationExplained(form)} The classification is the engineer&apos;s decision.
        </p>
      </Choice>
      <div className="grid gap-3 sm:grid-cols-3">
        {number("S", "Allowable S", "The code's allowable at the design temperature.")}
        {form.allowableSource === "typed" &&
          number("Sy", "Yield Sy", "Optional; sets SPS = 2Sy when larger.")}
        {form.allowableSource === "typed" &&
          number("Su", "Ultimate Su", "Optional; needed to confirm Sy/Su ≤ 0.7.")}
      </div>
      <Choice
        legend="Sy and Su"
        name="allowable-source"
        value={form.allowableSource}
        options={[
          { value: "typed", label: "typed here" },
          { value: "material", label: "from the location's (else the project's) material" },
        ]}
        onChange={(v) => set("allowableSource", v)}
      >
        {form.allowableSource === "material" && (
          <p className="text-[13px] text-graphite-soft">{locationHasMaterialNote}</p>
        )}
      </Choice>
      <label className="flex items-center gap-2 text-[15px]">
        <input
          type="checkbox"
          checked={form.timeDependent}
          onChange={(e) => set("timeDependent", e.target.checked)}
        />
        S is governed by time-dependent (creep) properties (then SPS = 3S)
      </label>
      <Choice
        legend="Equivalent stress of each linearized tensor"
        name="equivalent"
        value={form.equivalent}
        options={[
          { value: "von-mises", label: "von Mises (default)" },
          { value: "tresca", label: "Tresca stress intensity σ₁ − σ₃" },
        ]}
        onChange={(v) => set("equivalent", v)}
      />
      <label className="flex items-start gap-2 text-[15px]">
        <input
          type="checkbox"
          className="mt-1"
          checked={form.bendEveryComponent}
          onChange={(e) => set("bendEveryComponent", e.target.checked)}
        />
        <span>
          Bend every component
          <span className="block text-[13px] text-graphite-soft">
            Off (the default): bending is taken only for the two normal stresses perpendicular to the line, as
            Annex 5-A describes; on: for all six, as some practices do. The results say which was used.
          </span>
        </span>
      </label>
    </div>
  );
}
