import {
  DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes,
  type NonAttribute, type Sequelize,
} from "sequelize";
import type { FlattenParams } from "@/lib/validations/flatten";
import type { Project } from "@/models/project";
import type { Scan } from "@/models/scan";
import type { SeamMap } from "@/models/seam-map";
import type { Shop } from "@/models/shop";
import type { User } from "@/models/user";
import type { PatternPiece } from "@/models/pattern-piece";
import type { PatternReview } from "@/models/pattern-review";

export const PATTERN_STATUSES = ["queued", "processing", "ready", "failed"] as const;
export type PatternStatus = (typeof PATTERN_STATUSES)[number];
import { REVIEW_STATUSES, type ReviewStatus } from "@/lib/reviews/review-decisions";

/** S3 keys of the documents a flatten job wrote (deterministic from the pattern id). */
export interface PatternFiles {
  report: string;
  svg: string;
  /** the PDF on the paper chosen at queue time; other papers are rendered on request and cached */
  pdf: string;
  pdfPaper: string;
  assembly: string | null;
}

/** One flatten run of a scan with one seam-map version and its parameters. */
export class Pattern extends Model<InferAttributes<Pattern>, InferCreationAttributes<Pattern>> {
  declare id: CreationOptional<string>;
  declare shopId: ForeignKey<Shop["id"]>;
  declare projectId: ForeignKey<Project["id"]>;
  declare scanId: ForeignKey<Scan["id"]>;
  declare seamMapId: ForeignKey<SeamMap["id"]> | null;
  declare createdById: ForeignKey<User["id"]> | null;
  /** null: flattened without seams (no seam map saved yet) */
  declare seamMapVersion: number | null;
  declare params: FlattenParams;
  declare status: CreationOptional<PatternStatus>;
  declare error: CreationOptional<string | null>;
  declare reviewStatus: CreationOptional<ReviewStatus>;
  /** the flatten report without the pieces' bulky arrays (those are in pattern_pieces) */
  declare report: CreationOptional<Record<string, unknown> | null>;
  declare files: CreationOptional<PatternFiles | null>;
  declare completedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare pieces?: NonAttribute<PatternPiece[]>;
  declare reviews?: NonAttribute<PatternReview[]>;
  declare scan?: NonAttribute<Scan>;
  declare project?: NonAttribute<Project>;

  static initModel(sequelize: Sequelize): typeof Pattern {
    Pattern.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        seamMapVersion: { type: DataTypes.INTEGER, allowNull: true },
        params: { type: DataTypes.JSONB, allowNull: false },
        status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "queued", validate: { isIn: [PATTERN_STATUSES as unknown as string[]] } },
        error: { type: DataTypes.TEXT, allowNull: true },
        reviewStatus: { type: DataTypes.STRING(20), allowNull: false, defaultValue: "pending", validate: { isIn: [REVIEW_STATUSES as unknown as string[]] } },
        report: { type: DataTypes.JSONB, allowNull: true },
        files: { type: DataTypes.JSONB, allowNull: true },
        completedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "patterns", modelName: "Pattern", underscored: true },
    );
    return Pattern;
  }
}
