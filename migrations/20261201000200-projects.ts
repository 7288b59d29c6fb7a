import { DataTypes, literal } from "sequelize";
import type { Migration } from "@/lib/db/migrator";

/** Projects of a shop (client/show, due date, notes, status). */
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.createTable("projects", {
      id: { type: DataTypes.UUID, primaryKey: true, allowNull: false, defaultValue: literal("gen_random_uuid()") },
      shop_id: { type: DataTypes.UUID, allowNull: false, references: { model: "shops", key: "id" }, onDelete: "CASCADE" },
      created_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: "users", key: "id" }, onDelete: "SET NULL" },
      name: { type: DataTypes.STRING(160), allowNull: false },
      client: { type: DataTypes.STRING(160), allowNull: true },
      due_date: { type: DataTypes.DATEONLY, allowNull: true },
      notes: { type: DataTypes.TEXT, allowNull: true },
      status: { type: DataTypes.STRING(20), allowNull: false, defaultValue: "planning" },
      created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: literal("CURRENT_TIMESTAMP") },
      updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: literal("CURRENT_TIMESTAMP") },
    }, { transaction });
    await qi.sequelize.query(
      `ALTER TABLE projects ADD CONSTRAINT projects_status_check
         CHECK (status IN ('planning', 'patterning', 'in_review', 'approved', 'building', 'delivered'))`,
      { transaction });
    await qi.addIndex("projects", ["shop_id", "created_at"], { name: "projects_shop_created", transaction });
  });
};

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable("projects");
};
