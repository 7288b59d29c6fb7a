import {
  DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes,
  type NonAttribute, type Sequelize,
} from "sequelize";
import { ROLES, type Role } from "@/lib/permissions/roles";
import type { User } from "@/models/user";
import type { Shop } from "@/models/shop";

/**
 * An owner's invitation of an e-mail address into a shop with a role. Only the SHA-256 of the link token is stored,
 * so a database leak does not hand out working links.
 */
export class Invitation extends Model<InferAttributes<Invitation>, InferCreationAttributes<Invitation>> {
  declare id: CreationOptional<string>;
  declare shopId: ForeignKey<Shop["id"]>;
  declare invitedById: ForeignKey<User["id"]> | null;
  declare email: string;
  declare role: Role;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare acceptedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare shop?: NonAttribute<Shop>;

  static initModel(sequelize: Sequelize): typeof Invitation {
    Invitation.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        email: {
          type: DataTypes.STRING(254),
          allowNull: false,
          set(value: string) {
            this.setDataValue("email", value.trim().toLowerCase());
          },
        },
        role: { type: DataTypes.STRING(20), allowNull: false, validate: { isIn: [ROLES as unknown as string[]] } },
        tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        acceptedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "invitations", modelName: "Invitation", underscored: true },
    );
    return Invitation;
  }
}
