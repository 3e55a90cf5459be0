import type { Transaction } from "sequelize";
import { FROM_MEMORY_NOTE, publishedMaterial, type Material as Strengths } from "../../../core";
import type { MaterialRef } from "../../../core/contract/materials";
import { findLiveMaterial, listLiveMaterials, type MaterialRow } from "../../../db/repositories/materials";
import { errors } from "../../errors";

/** The two columns a material reference is stored in (at most one is set). */
export type MaterialColumns = { materialId: string | null; publishedMaterial: string | null };

/** A stored pair of columns as the reference the API sends. */
export function refFromColumns(materialId: string | null, published: string | null): MaterialRef | null {
  if (materialId) return { kind: "workspace", id: materialId };
  if (published) return { kind: "published", id: published };
  return null;
}

/** A reference as the two columns it is stored in. */
export function columnsFromRef(ref: MaterialRef | null): MaterialColumns {
  return {
    materialId: ref?.kind === "workspace" ? ref.id : null,
    publishedMaterial: ref?.kind === "published" ? ref.id : null,
  };
}

/**
 * Refuses (400, naming `field`) a reference to a built-in grade that does not exist or to a
 * library material that is not in this workspace or is in the trash.
 */
export async function assertMaterialRef(
  workspaceId: string,
  ref: MaterialRef | null | undefined,
  field: string,
  transaction?: Transaction,
): Promise<void> {
  if (!ref) return;
  if (ref.kind === "published") {
    if (!publishedMaterial(ref.id)) {
      throw errors.invalidInput([
        { path: `${field}.id`, message: `there is no built-in material "${ref.id}"` },
      ]);
    }
    return;
  }
  const found = await findLiveMaterial(workspaceId, ref.id, { transaction });
  if (!found) {
    throw errors.invalidInput([
      { path: `${field}.id`, message: "no material of this workspace's library has this id" },
    ]);
  }
}

const MPA = 1e6;

/** The material a check uses, resolved: strengths in Pa for core, and how to name it. */
export type ResolvedMaterial = {
  strengths: Strengths;
  label: string;
  kind: "published" | "workspace" | "none";
  note: string;
};

const NONE: ResolvedMaterial = {
  strengths: {},
  label: "no material",
  kind: "none",
  note: "Choose a material for the project or this location to get safety factors.",
};

/** Strengths only when given (core treats an absent strength as "cannot evaluate"). */
function strengthsOf(
  y: number | null | undefined,
  t: number | null | undefined,
  c: number | null | undefined,
) {
  const s: Strengths = {};
  if (y) s.yield = y;
  if (t) s.ultimateTension = t;
  if (c) s.ultimateCompression = c;
  return s;
}

/** What resolving reads of a library material. */
export type LibraryStrengths = Pick<
  MaterialRow,
  "name" | "reference" | "yieldPa" | "ultimateTensionPa" | "ultimateCompressionPa"
>;

/**
 * Resolves a reference against the built-in list and the workspace library (`library`, by
 * id, trashed rows left out); a dangling reference resolves to "no material", said so.
 */
export function resolveMaterial(
  ref: MaterialRef | null,
  library: Map<string, LibraryStrengths>,
): ResolvedMaterial {
  if (!ref) return NONE;
  if (ref.kind === "published") {
    const m = publishedMaterial(ref.id);
    if (!m) return { ...NONE, note: `The built-in material "${ref.id}" is not known here.` };
    return {
      // The built-in list says whether a grade is brittle; core uses it to pick the criteria that apply.
      strengths: {
        ...strengthsOf(
          m.yield === undefined ? null : m.yield * MPA,
          m.ultimateTension * MPA,
          m.ultimateCompression * MPA,
        ),
        behaviour: m.brittle ? "brittle" : "ductile",
      },
      label: `${m.name} (${m.standard})`,
      kind: "published",
      note: `Published minimum values, ${FROM_MEMORY_NOTE}.`,
    };
  }
  const m = library.get(ref.id);
  if (!m) return { ...NONE, note: "The library material chosen here was deleted." };
  return {
    strengths: strengthsOf(m.yieldPa, m.ultimateTensionPa, m.ultimateCompressionPa),
    label: m.name,
    kind: "workspace",
    note: m.reference ? `Values from ${m.reference}.` : "Library material with no reference given.",
  };
}

/** The workspace's library materials not in the trash, by id. */
export async function libraryOf(
  workspaceId: string,
  transaction?: Transaction,
): Promise<Map<string, MaterialRow>> {
  const rows = await listLiveMaterials(workspaceId, transaction);
  return new Map(rows.map((m) => [m.id, m]));
}
