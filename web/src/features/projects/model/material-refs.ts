import type { MaterialList, MaterialRef } from "../../../../../core/contract/materials";

/** The value a <select> carries for a reference ("" = none / use the default). */
export const refValue = (ref: MaterialRef | null) => (ref ? `${ref.kind}:${ref.id}` : "");

/** A reference from a <select> value (everything after the first colon is the id). */
export function refFromValue(value: string): MaterialRef | null {
  if (!value) return null;
  const [kind, id] = value.split(/:(.*)/s);
  return kind === "workspace" ? { kind: "workspace", id } : { kind: "published", id };
}

/**
 * The name of the material a reference points at, with its standard for built-in grades; a
 * published id the list does not know is shown as itself, a deleted library material says so.
 */
export function materialName(ref: MaterialRef | null, list: MaterialList | undefined): string | null {
  if (!ref || !list) return null;
  if (ref.kind === "published") {
    const m = list.published.find((p) => p.id === ref.id);
    return m ? `${m.name} (${m.standard})` : ref.id;
  }
  return list.materials.find((m) => m.id === ref.id)?.name ?? "(deleted material)";
}
