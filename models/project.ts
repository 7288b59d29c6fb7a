import {
  DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import { PROJECT_STATUSES, type ProjectStatus } from "@/lib/projects/project-status";
import type { User } from "@/models/user";
import type { Shop } from "@/models/shop";

/** A build for a client or show: the container for scans, seam maps and patterns (added by later migrations). */
export class Project extends Model<InferAttributes<Project>, InferCreationAttributes<Project>> {
  declare id: CreationOptional<string>;
  declare shopId: ForeignKey<Shop["id"]>;
  declare createdById: ForeignKey<User["id"]> | null;
  declare name: string;
  declare client: CreationOptional<string | null>;
  /** Calendar date "YYYY-MM-DD" (DATEONLY: no time zone shift). */
  declare dueDate: CreationOptional<string | null>;
  declare notes: CreationOptional<string | null>;
  declare status: CreationOptional<ProjectStatus>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof Project {
    Project.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        name: { type: DataTypes.STRING(160), allowNull: false },
        client: { type: DataTypes.STRING(160), allowNull: true },
        dueDate: { type: DataTypes.DATEONLY, allowNull: true },
        notes: { type: DataTypes.TEXT, allowNull: true },
        status: {
          type: DataTypes.STRING(20), allowNull: false, defaultValue: "planning",
          validate: { isIn: [PROJECT_STATUSES as unknown as string[]] },
        },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "projects", modelName: "Project", underscored: true },
    );
    return Project;
  }
}
