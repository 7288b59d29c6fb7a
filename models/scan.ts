import {
  DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { LengthUnit } from "@/lib/geometry/mesh";
import type { MeshReport } from "@/lib/geometry/report-types";
import type { Project } from "@/models/project";
import type { Shop } from "@/models/shop";
import type { User } from "@/models/user";

export const SCAN_STATUSES = ["processing", "ready", "failed"] as const;
export type ScanStatus = (typeof SCAN_STATUSES)[number];

/**
 * An uploaded mesh of a project. The intake job (workers/processors/scan-intake.ts) fills report, counts and the
 * keys of the working meshes; `error` is one sentence when it failed. Object keys derive from the id
 * (lib/scans/scan-keys.ts), so a retried intake overwrites instead of adding objects.
 */
export class Scan extends Model<InferAttributes<Scan>, InferCreationAttributes<Scan>> {
  declare id: CreationOptional<string>;
  declare shopId: ForeignKey<Shop["id"]>;
  declare projectId: ForeignKey<Project["id"]>;
  declare createdById: ForeignKey<User["id"]> | null;
  /** the uploaded file's name, for people (never trusted for the format) */
  declare name: string;
  declare units: LengthUnit;
  declare status: CreationOptional<ScanStatus>;
  declare error: CreationOptional<string | null>;
  declare format: CreationOptional<MeshReport["format"] | null>;
  /** bytes of the original upload (BIGINT: pg returns it as text, the getter makes it a number) */
  declare byteSize: number;
  declare originalKey: string;
  declare workingKey: CreationOptional<string | null>;
  declare intakeKey: CreationOptional<string | null>;
  declare report: CreationOptional<MeshReport | null>;
  declare vertexCount: CreationOptional<number | null>;
  declare faceCount: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof Scan {
    Scan.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        name: { type: DataTypes.STRING(255), allowNull: false },
        units: { type: DataTypes.STRING(4), allowNull: false },
        status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "processing", validate: { isIn: [SCAN_STATUSES as unknown as string[]] } },
        error: { type: DataTypes.TEXT, allowNull: true },
        format: { type: DataTypes.STRING(12), allowNull: true },
        byteSize: {
          type: DataTypes.BIGINT, allowNull: false,
          get(this: Scan) {
            const raw = this.getDataValue("byteSize") as unknown;
            return raw === null || raw === undefined ? raw : Number(raw);
          },
        },
        originalKey: { type: DataTypes.STRING(255), allowNull: false },
        workingKey: { type: DataTypes.STRING(255), allowNull: true },
        intakeKey: { type: DataTypes.STRING(255), allowNull: true },
        report: { type: DataTypes.JSONB, allowNull: true },
        vertexCount: { type: DataTypes.INTEGER, allowNull: true },
        faceCount: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "scans", modelName: "Scan", underscored: true },
    );
    return Scan;
  }
}
