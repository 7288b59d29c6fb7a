import {
  DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes,
  type NonAttribute, type Sequelize,
} from "sequelize";
import { ROLES, type Role } from "@/lib/permissions/roles";
import type { User } from "@/models/user";
import type { Shop } from "@/models/shop";

/** A user's role in one shop (at most one membership per user and shop). */
export class Membership extends Model<InferAttributes<Membership>, InferCreationAttributes<Membership>> {
  declare id: CreationOptional<string>;
  declare userId: ForeignKey<User["id"]>;
  declare shopId: ForeignKey<Shop["id"]>;
  declare role: Role;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare user?: NonAttribute<User>;
  declare shop?: NonAttribute<Shop>;

  static initModel(sequelize: Sequelize): typeof Membership {
    Membership.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        role: { type: DataTypes.STRING(20), allowNull: false, validate: { isIn: [ROLES as unknown as string[]] } },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      {
        sequelize, tableName: "memberships", modelName: "Membership", underscored: true,
        indexes: [{ unique: true, fields: ["user_id", "shop_id"] }],
      },
    );
    return Membership;
  }
}
