import type { Sequelize } from "sequelize";
import { User } from "@/models/user";
import { Shop } from "@/models/shop";
import { Membership } from "@/models/membership";
import { Invitation } from "@/models/invitation";
import { PasswordResetToken } from "@/models/password-reset-token";
import { Project } from "@/models/project";

export { User, Shop, Membership, Invitation, PasswordResetToken, Project };

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
}
