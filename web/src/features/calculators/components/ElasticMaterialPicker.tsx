import { useQueries } from "@tanstack/react-query";
import { useId, useState } from "react";
import { PUBLISHED_MATERIALS } from "../../../../../core";
import { materialsQueryOptions } from "../../../entities/material/queries";
import { useWorkspaces } from "../../../entities/workspace/queries";
import { useSession } from "../../../lib/session";
import {
  builtInElasticSources,
  elasticInputs,
  libraryElasticSources,
  type ElasticSource,
} from "../model/elastic-constants";
import type { UnitSet } from "../model/units";

const BUILT_IN = builtInElasticSources(PUBLISHED_MATERIALS);

/**
 * Fills E and ν from a material: a built-in grade (typical values, recalled from memory) or, for
 * a signed-in person, a material of one of their workspace libraries that gives both. The fields
 * stay editable: a typed value is always taken as typed.
 */
export function ElasticMaterialPicker({
  units,
  onPick,
}: {
  units: UnitSet;
  onPick: (values: { E: number; nu: number }) => void;
}) {
  const id = useId();
  const [picked, setPicked] = useState<ElasticSource | null>(null);
  const session = useSession();
  const signedIn = !!session.data?.user;
  const workspaces = useWorkspaces();
  const list = signedIn ? (workspaces.data?.workspaces ?? []) : [];
  const libraries = useQueries({
    queries: list.map((w) => ({ ...materialsQueryOptions(w.id), enabled: signedIn })),
  });
  const groups = [
    { label: "Built-in grades (typical values)", sources: BUILT_IN },
    ...list.map((w, i) => ({
      label: `${w.name} library`,
      sources: libraryElasticSources(libraries[i]?.data?.materials ?? []),
    })),
  ].filter((g) => g.sources.length > 0);
  const all = groups.flatMap((g) => g.sources);
  return (
    <div className="text-[13px]">
      <label htmlFor={id} className="block text-[12px] text-graphite-soft">
        E and ν from a material
      </label>
      <select
        id={id}
        value={picked?.id ?? ""}
        onChange={(e) => {
          const source = all.find((s) => s.id === e.target.value) ?? null;
          setPicked(source);
          if (source) onPick(elasticInputs(source, units));
        }}
        className="mt-0.5 w-full rounded-sm border border-rule-strong bg-panel px-1 py-1"
      >
        <option value="">typed below</option>
        {groups.map((g) => (
          <optgroup key={g.label} label={g.label}>
            {g.sources.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name}
              </option>
            ))}
          </optgroup>
        ))}
      </select>
      {picked && (
        <p className="mt-0.5 text-[12px] text-graphite-soft" data-testid="elastic-source">
          Filled from {picked.name}
          {picked.note ? ` — ${picked.note}` : ""}. Edit E or ν to use your own values.
        </p>
      )}
    </div>
  );
}
