import { DataTypes, literal } from "sequelize";
import type { Migration } from "@/lib/db/migrator";

/** Users, shops, memberships (role per user and shop), invitations and password reset tokens. */

const ROLE_CHECK = "role IN ('owner', 'designer', 'reviewer', 'fabricator')";

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: literal("CURRENT_TIMESTAMP") },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: literal("CURRENT_TIMESTAMP") },
};
const uuidPk = { type: DataTypes.UUID, primaryKey: true, allowNull: false, defaultValue: literal("gen_random_uuid()") };

export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.createTable("users", {
      id: uuidPk,
      name: { type: DataTypes.STRING(120), allowNull: false },
      email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
      password_hash: { type: DataTypes.STRING(100), allowNull: false },
      session_version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      ...timestamps,
    }, { transaction });
    await qi.sequelize.query(
      `ALTER TABLE users ADD CONSTRAINT users_email_lower CHECK (email = lower(email))`, { transaction });

    await qi.createTable("shops", {
      id: uuidPk,
      name: { type: DataTypes.STRING(120), allowNull: false },
      ...timestamps,
    }, { transaction });

    await qi.createTable("memberships", {
      id: uuidPk,
      user_id: { type: DataTypes.UUID, allowNull: false, references: { model: "users", key: "id" }, onDelete: "CASCADE" },
      shop_id: { type: DataTypes.UUID, allowNull: false, references: { model: "shops", key: "id" }, onDelete: "CASCADE" },
      role: { type: DataTypes.STRING(20), allowNull: false },
      ...timestamps,
    }, { transaction });
    await qi.sequelize.query(`ALTER TABLE memberships ADD CONSTRAINT memberships_role_check CHECK (${ROLE_CHECK})`, { transaction });
    await qi.addIndex("memberships", ["user_id", "shop_id"], { unique: true, name: "memberships_user_shop_unique", transaction });
    await qi.addIndex("memberships", ["shop_id"], { name: "memberships_shop_id", transaction });

    await qi.createTable("invitations", {
      id: uuidPk,
      shop_id: { type: DataTypes.UUID, allowNull: false, references: { model: "shops", key: "id" }, onDelete: "CASCADE" },
      invited_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: "users", key: "id" }, onDelete: "SET NULL" },
      email: { type: DataTypes.STRING(254), allowNull: false },
      role: { type: DataTypes.STRING(20), allowNull: false },
      token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
      expires_at: { type: DataTypes.DATE, allowNull: false },
      accepted_at: { type: DataTypes.DATE, allowNull: true },
      ...timestamps,
    }, { transaction });
    await qi.sequelize.query(`ALTER TABLE invitations ADD CONSTRAINT invitations_role_check CHECK (${ROLE_CHECK})`, { transaction });
    await qi.sequelize.query(
      `ALTER TABLE invitations ADD CONSTRAINT invitations_email_lower CHECK (email = lower(email))`, { transaction });
    await qi.addIndex("invitations", ["shop_id", "email"], { name: "invitations_shop_email", transaction });

    await qi.createTable("password_reset_tokens", {
      id: uuidPk,
      user_id: { type: DataTypes.UUID, allowNull: false, references: { model: "users", key: "id" }, onDelete: "CASCADE" },
      token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
      expires_at: { type: DataTypes.DATE, allowNull: false },
      used_at: { type: DataTypes.DATE, allowNull: true },
      ...timestamps,
    }, { transaction });
    await qi.addIndex("password_reset_tokens", ["user_id"], { name: "password_reset_tokens_user_id", transaction });
  });
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.dropTable("password_reset_tokens", { transaction });
    await qi.dropTable("invitations", { transaction });
    await qi.dropTable("memberships", { transaction });
    await qi.dropTable("shops", { transaction });
    await qi.dropTable("users", { transaction });
  });
};
