import {
  DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes,
  type NonAttribute, type Sequelize,
} from "sequelize";
import type { Pattern } from "@/models/pattern";
import type { User } from "@/models/user";

import { REVIEW_DECISIONS, type ReviewDecision } from "@/lib/reviews/review-decisions";

/** One review decision on a pattern; the latest decides the pattern's reviewStatus. */
export class PatternReview extends Model<InferAttributes<PatternReview>, InferCreationAttributes<PatternReview>> {
  declare id: CreationOptional<string>;
  declare patternId: ForeignKey<Pattern["id"]>;
  declare reviewerId: ForeignKey<User["id"]> | null;
  declare decision: ReviewDecision;
  declare comment: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare reviewer?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): typeof PatternReview {
    PatternReview.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        decision: { type: DataTypes.STRING(20), allowNull: false, validate: { isIn: [REVIEW_DECISIONS as unknown as string[]] } },
        comment: { type: DataTypes.TEXT, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "pattern_reviews", modelName: "PatternReview", underscored: true },
    );
    return PatternReview;
  }
}
