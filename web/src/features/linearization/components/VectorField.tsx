/** Three numbers as typed, x y z. */
export type TypedVector = [string, string, string];

const input = "w-full rounded border border-rule-strong bg-panel px-2 py-1 text-[15px]";
const label = "block text-sm font-semibold text-graphite";

/**
 * A point or direction typed as x, y and z under one legend, with an optional hint and the field's
 * error below. Each box is named with the legend ("First end x"), since "x" alone says nothing to a
 * screen reader on a form with several of them.
 */
export function VectorField({
  id,
  legend,
  value,
  onChange,
  error,
  hint,
}: {
  id: string;
  legend: string;
  value: TypedVector;
  onChange: (v: TypedVector) => void;
  error?: string;
  hint?: string;
}) {
  return (
    <fieldset className="space-y-1" aria-describedby={error ? `${id}-error` : undefined}>
      <legend className={label}>{legend}</legend>
      <div className="flex gap-2">
        {(["x", "y", "z"] as const).map((axis, i) => (
          <label key={axis} className="flex items-center gap-1 text-sm">
            {axis}
            <input
              id={`${id}-${axis}`}
              aria-label={`${legend} ${axis}`}
              inputMode="decimal"
              className={`${input} num w-20`}
              value={value[i]}
              onChange={(e) => {
                const next: TypedVector = [...value];
                next[i] = e.target.value;
                onChange(next);
              }}
            />
          </label>
        ))}
      </div>
      {hint && <p className="text-[13px] text-graphite-soft">{hint}</p>}
      {error && (
        <p id={`${id}-error`} className="text-sm text-fail">
          <span aria-hidden="true">✗ </span>
          {error}
        </p>
      )}
    </fieldset>
  );
}
