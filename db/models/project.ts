import { DataTypes, Model, type Sequelize } from "sequelize";

/** A required safety factor for one criterion, as stored in `projects.requirements`. */
export type StoredRequirement = { criterion: string; requiredFactor: number };

/** Per load-case category, the factors that replace the default's, as stored in `projects.category_requirements`. */
export type StoredCategoryRequirement = { category: string; factors: Record<string, number> };

/** A project in a workspace (table `projects`): what is checked, against which factors and material. */
export class Project extends Model {
  declare id: string;
  declare workspaceId: string;
  declare name: string;
  declare description: string;
  declare unitSystem: "SI" | "US";
  /** The project-wide default requirements. */
  declare requirements: StoredRequirement[];
  declare categoryRequirements: StoredCategoryRequirement[];
  /** Rate criteria that do not suit a material and let them govern (the user's choice). */
  declare includeUnsuitedCriteria: boolean;
  /** Library material used where a location names none (or null). */
  declare defaultMaterialId: string | null;
  /** Built-in published grade used where a location names none (or null). */
  declare defaultPublishedMaterial: string | null;
  declare version: number;
  /** How many independent approvals a calculation record of the project needs (1 or 2). */
  declare requiredApprovals: number;
  declare createdBy: string | null;
  declare updatedBy: string | null;
  declare deletedAt: Date | null;
  declare deletedBy: string | null;
  declare createdAt: Date;
  declare updatedAt: Date;
}

export function initProject(sequelize: Sequelize) {
  Project.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      workspaceId: { type: DataTypes.UUID, allowNull: false },
      name: { type: DataTypes.STRING(150), allowNull: false },
      description: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
      unitSystem: { type: DataTypes.STRING(2), allowNull: false, defaultValue: "SI" },
      requirements: { type: DataTypes.JSONB, allowNull: false },
      categoryRequirements: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
      includeUnsuitedCriteria: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      defaultMaterialId: { type: DataTypes.UUID, allowNull: true },
      defaultPublishedMaterial: { type: DataTypes.STRING(40), allowNull: true },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      requiredApprovals: { type: DataTypes.SMALLINT, allowNull: false, defaultValue: 1 },
      createdBy: { type: DataTypes.UUID, allowNull: true },
      updatedBy: { type: DataTypes.UUID, allowNull: true },
      deletedAt: { type: DataTypes.DATE, allowNull: true },
      deletedBy: { type: DataTypes.UUID, allowNull: true },
    },
    { sequelize, tableName: "projects" },
  );
  return Project;
}
