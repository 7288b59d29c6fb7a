import {
  DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { Scan } from "@/models/scan";
import type { User } from "@/models/user";

/** What a seam map cuts the scan into (stored with the version, answered by PUT /api/scans/[id]/seams). */
export interface SeamMapPiece {
  label: string;
  faces: number;
  isDisk: boolean;
  boundaryLoops: number;
  genus: number;
  problem: string | null;
  /** input-file vertex pairs that would make the piece a disk */
  suggestedCut: [number, number][] | null;
}

/** One saved version of a scan's seams (input-file vertex index pairs). Versions count 1, 2, … per scan. */
export class SeamMap extends Model<InferAttributes<SeamMap>, InferCreationAttributes<SeamMap>> {
  declare id: CreationOptional<string>;
  declare scanId: ForeignKey<Scan["id"]>;
  declare createdById: ForeignKey<User["id"]> | null;
  declare version: number;
  declare seams: [number, number][];
  /** distinct seam edges after resolution */
  declare edgeCount: number;
  declare pieces: SeamMapPiece[];
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof SeamMap {
    SeamMap.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        version: { type: DataTypes.INTEGER, allowNull: false },
        seams: { type: DataTypes.JSONB, allowNull: false },
        edgeCount: { type: DataTypes.INTEGER, allowNull: false },
        pieces: { type: DataTypes.JSONB, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      {
        sequelize, tableName: "seam_maps", modelName: "SeamMap", underscored: true,
        indexes: [{ unique: true, fields: ["scan_id", "version"] }],
      },
    );
    return SeamMap;
  }
}
