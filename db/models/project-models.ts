import type { Sequelize } from "sequelize";
import { initAuditEvent } from "./audit-event";
import { initCombination } from "./combination";
import { initCombinationTerm } from "./combination-term";
import { initLinearization } from "./linearization";
import { initLoadCase } from "./load-case";
import { initLocation } from "./location";
import { initMaterial } from "./material";
import { initPointTable } from "./point-table";
import { initPointTableChunk } from "./point-table-chunk";
import { initProject } from "./project";
import { initStressState } from "./stress-state";

/**
 * Registers the project models (materials, projects, locations, load cases, stress states,
 * combinations and their terms, the audit trail, saved stress classification lines, finite-element
 * point tables and their chunks). Queries join them explicitly by id, so no
 * associations are declared.
 */
export function initProjectModels(sequelize: Sequelize) {
  return {
    Material: initMaterial(sequelize),
    Project: initProject(sequelize),
    Location: initLocation(sequelize),
    LoadCase: initLoadCase(sequelize),
    StressState: initStressState(sequelize),
    Combination: initCombination(sequelize),
    CombinationTerm: initCombinationTerm(sequelize),
    AuditEvent: initAuditEvent(sequelize),
    Linearization: initLinearization(sequelize),
    PointTable: initPointTable(sequelize),
    PointTableChunk: initPointTableChunk(sequelize),
  };
}
