import type { Sequelize } from "sequelize";
import { User } from "@/models/user";
import { Shop } from "@/models/shop";
import { Membership } from "@/models/membership";
import { Invitation } from "@/models/invitation";
import { PasswordResetToken } from "@/models/password-reset-token";
import { Project } from "@/models/project";
import { Scan } from "@/models/scan";
import { SeamMap } from "@/models/seam-map";
import { Pattern } from "@/models/pattern";
import { PatternPiece } from "@/models/pattern-piece";
import { PatternReview } from "@/models/pattern-review";

export { User, Shop, Membership, Invitation, PasswordResetToken, Project };
export { Scan, SeamMap, Pattern, PatternPiece, PatternReview };

/**
 * Initialises every model on one Sequelize instance and wires the associations. Called once by getSequelize();
 * a later feature adds its model here (init + associations) next to its migration.
 */
export function initModels(sequelize: Sequelize): void {
  User.initModel(sequelize);
  Shop.initModel(sequelize);
  Membership.initModel(sequelize);
  Invitation.initModel(sequelize);
  PasswordResetToken.initModel(sequelize);
  Project.initModel(sequelize);
  Scan.initModel(sequelize);
  SeamMap.initModel(sequelize);
  Pattern.initModel(sequelize);
  PatternPiece.initModel(sequelize);
  PatternReview.initModel(sequelize);

  User.hasMany(Membership, { foreignKey: "userId", as: "memberships" });
  Membership.belongsTo(User, { foreignKey: "userId", as: "user" });
  Shop.hasMany(Membership, { foreignKey: "shopId", as: "memberships" });
  Membership.belongsTo(Shop, { foreignKey: "shopId", as: "shop" });

  Shop.hasMany(Invitation, { foreignKey: "shopId", as: "invitations" });
  Invitation.belongsTo(Shop, { foreignKey: "shopId", as: "shop" });
  Invitation.belongsTo(User, { foreignKey: "invitedById", as: "invitedBy" });

  User.hasMany(PasswordResetToken, { foreignKey: "userId", as: "passwordResetTokens" });
  PasswordResetToken.belongsTo(User, { foreignKey: "userId", as: "user" });

  Shop.hasMany(Project, { foreignKey: "shopId", as: "projects" });
  Project.belongsTo(Shop, { foreignKey: "shopId", as: "shop" });
  Project.belongsTo(User, { foreignKey: "createdById", as: "createdBy" });

  // scans, seam maps, patterns, reviews (lib/scans, lib/seam-maps, lib/patterns-store, lib/reviews)
  Project.hasMany(Scan, { foreignKey: "projectId", as: "scans" });
  Scan.belongsTo(Project, { foreignKey: "projectId", as: "project" });
  Scan.belongsTo(Shop, { foreignKey: "shopId", as: "shop" });
  Scan.belongsTo(User, { foreignKey: "createdById", as: "createdBy" });
  Scan.hasMany(SeamMap, { foreignKey: "scanId", as: "seamMaps" });
  SeamMap.belongsTo(Scan, { foreignKey: "scanId", as: "scan" });
  SeamMap.belongsTo(User, { foreignKey: "createdById", as: "createdBy" });
  Project.hasMany(Pattern, { foreignKey: "projectId", as: "patterns" });
  Pattern.belongsTo(Project, { foreignKey: "projectId", as: "project" });
  Pattern.belongsTo(Shop, { foreignKey: "shopId", as: "shop" });
  Pattern.belongsTo(Scan, { foreignKey: "scanId", as: "scan" });
  Pattern.belongsTo(SeamMap, { foreignKey: "seamMapId", as: "seamMap" });
  Pattern.belongsTo(User, { foreignKey: "createdById", as: "createdBy" });
  Pattern.hasMany(PatternPiece, { foreignKey: "patternId", as: "pieces" });
  PatternPiece.belongsTo(Pattern, { foreignKey: "patternId", as: "pattern" });
  Pattern.hasMany(PatternReview, { foreignKey: "patternId", as: "reviews" });
  PatternReview.belongsTo(Pattern, { foreignKey: "patternId", as: "pattern" });
  PatternReview.belongsTo(User, { foreignKey: "reviewerId", as: "reviewer" });
}
