import type { Sequelize } from "sequelize";
import { initAppSetting } from "./app-setting";

/** Registers every model on `sequelize` (call once per instance). */
export function initModels(sequelize: Sequelize) {
  return {
    AppSetting: initAppSetting(sequelize),
  };
}

export type Models = ReturnType<typeof initModels>;
