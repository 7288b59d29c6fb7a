import {
  DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { StretchMetrics, Tick } from "@/lib/geometry/report-types";
import type { PipelinePieceReport } from "@/lib/geometry/pipeline/flatten-mesh";
import type { Pattern } from "@/models/pattern";

/** The PieceReport fields not kept in their own column (areas, lengths, solver, placement, count, …). */
export type PieceDetails = Omit<PipelinePieceReport, "label" | "flattenable" | "problem" | "metrics" | "outline" | "bevels" | "ticks">;

/** One piece of a pattern, unique per pattern and label; the heat-map arrays are in S3 under heatmapKey. */
export class PatternPiece extends Model<InferAttributes<PatternPiece>, InferCreationAttributes<PatternPiece>> {
  declare id: CreationOptional<string>;
  declare patternId: ForeignKey<Pattern["id"]>;
  declare label: string;
  /** order of the piece in the report */
  declare position: number;
  declare flattenable: boolean;
  declare problem: string | null;
  declare metrics: StretchMetrics | null;
  declare outline: [number, number][];
  declare bevels: PipelinePieceReport["bevels"];
  declare ticks: Tick[];
  declare details: PieceDetails;
  declare heatmapKey: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof PatternPiece {
    PatternPiece.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        label: { type: DataTypes.STRING(8), allowNull: false },
        position: { type: DataTypes.INTEGER, allowNull: false },
        flattenable: { type: DataTypes.BOOLEAN, allowNull: false },
        problem: { type: DataTypes.TEXT, allowNull: true },
        metrics: { type: DataTypes.JSONB, allowNull: true },
        outline: { type: DataTypes.JSONB, allowNull: false },
        bevels: { type: DataTypes.JSONB, allowNull: false },
        ticks: { type: DataTypes.JSONB, allowNull: false },
        details: { type: DataTypes.JSONB, allowNull: false },
        heatmapKey: { type: DataTypes.STRING(255), allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      {
        sequelize, tableName: "pattern_pieces", modelName: "PatternPiece", underscored: true,
        indexes: [{ unique: true, fields: ["pattern_id", "label"] }],
      },
    );
    return PatternPiece;
  }
}
