import type { Model, ModelStatic } from "sequelize";
import type { TrashKind } from "../../../core/contract/projects";
import type { AuditEntityType } from "../../../db/models/audit-event";
import { Combination } from "../../../db/models/combination";
import { LoadCase } from "../../../db/models/load-case";
import { Location } from "../../../db/models/location";
import { Material } from "../../../db/models/material";
import { Project } from "../../../db/models/project";

/** A row that can be in the trash. */
export type TrashableRow = Model & {
  id: string;
  name: string;
  deletedAt: Date | null;
  deletedBy: string | null;
  projectId?: string;
  workspaceId?: string;
};

/** Where each kind lives: its model, and whether it hangs off a project or straight off the workspace. */
export const TRASH_MODELS: Record<
  TrashKind,
  { model: ModelStatic<TrashableRow>; scope: "workspace" | "project"; entity: AuditEntityType; label: string }
> = {
  project: {
    model: Project as unknown as ModelStatic<TrashableRow>,
    scope: "workspace",
    entity: "project",
    label: "project",
  },
  material: {
    model: Material as unknown as ModelStatic<TrashableRow>,
    scope: "workspace",
    entity: "material",
    label: "material",
  },
  location: {
    model: Location as unknown as ModelStatic<TrashableRow>,
    scope: "project",
    entity: "location",
    label: "location",
  },
  "load-case": {
    model: LoadCase as unknown as ModelStatic<TrashableRow>,
    scope: "project",
    entity: "load-case",
    label: "load case",
  },
  combination: {
    model: Combination as unknown as ModelStatic<TrashableRow>,
    scope: "project",
    entity: "combination",
    label: "combination",
  },
};
