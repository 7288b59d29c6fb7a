import { DataTypes, literal } from "sequelize";
import type { Migration } from "@/lib/db/migrator";

/**
 * Patterns (one flatten run of a scan's seam map: parameters, status, report and document keys), their pieces
 * (one row per piece label: metrics, outline, bevel runs, ticks, heat-map key) and review decisions.
 */

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: literal("CURRENT_TIMESTAMP") },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: literal("CURRENT_TIMESTAMP") },
};
const uuidPk = { type: DataTypes.UUID, primaryKey: true, allowNull: false, defaultValue: literal("gen_random_uuid()") };

export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.createTable("patterns", {
      id: uuidPk,
      shop_id: { type: DataTypes.UUID, allowNull: false, references: { model: "shops", key: "id" }, onDelete: "CASCADE" },
      project_id: { type: DataTypes.UUID, allowNull: false, references: { model: "projects", key: "id" }, onDelete: "CASCADE" },
      scan_id: { type: DataTypes.UUID, allowNull: false, references: { model: "scans", key: "id" }, onDelete: "CASCADE" },
      seam_map_id: { type: DataTypes.UUID, allowNull: true, references: { model: "seam_maps", key: "id" }, onDelete: "SET NULL" },
      created_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: "users", key: "id" }, onDelete: "SET NULL" },
      seam_map_version: { type: DataTypes.INTEGER, allowNull: true },
      params: { type: DataTypes.JSONB, allowNull: false },
      status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "queued" },
      error: { type: DataTypes.TEXT, allowNull: true },
      review_status: { type: DataTypes.STRING(20), allowNull: false, defaultValue: "pending" },
      report: { type: DataTypes.JSONB, allowNull: true },
      files: { type: DataTypes.JSONB, allowNull: true },
      completed_at: { type: DataTypes.DATE, allowNull: true },
      ...timestamps,
    }, { transaction });
    await qi.sequelize.query(
      `ALTER TABLE patterns ADD CONSTRAINT patterns_status_check CHECK (status IN ('queued', 'processing', 'ready', 'failed'))`,
      { transaction });
    await qi.sequelize.query(
      `ALTER TABLE patterns ADD CONSTRAINT patterns_review_status_check CHECK (review_status IN ('pending', 'approved', 'changes_requested'))`,
      { transaction });
    await qi.addIndex("patterns", ["project_id", "created_at"], { name: "patterns_project_created", transaction });
    await qi.addIndex("patterns", ["scan_id"], { name: "patterns_scan_id", transaction });

    await qi.createTable("pattern_pieces", {
      id: uuidPk,
      pattern_id: { type: DataTypes.UUID, allowNull: false, references: { model: "patterns", key: "id" }, onDelete: "CASCADE" },
      label: { type: DataTypes.STRING(8), allowNull: false },
      position: { type: DataTypes.INTEGER, allowNull: false },
      flattenable: { type: DataTypes.BOOLEAN, allowNull: false },
      problem: { type: DataTypes.TEXT, allowNull: true },
      metrics: { type: DataTypes.JSONB, allowNull: true },
      outline: { type: DataTypes.JSONB, allowNull: false },
      bevels: { type: DataTypes.JSONB, allowNull: false },
      ticks: { type: DataTypes.JSONB, allowNull: false },
      details: { type: DataTypes.JSONB, allowNull: false },
      heatmap_key: { type: DataTypes.STRING(255), allowNull: true },
      ...timestamps,
    }, { transaction });
    await qi.addIndex("pattern_pieces", ["pattern_id", "label"], { unique: true, name: "pattern_pieces_pattern_label_unique", transaction });

    await qi.createTable("pattern_reviews", {
      id: uuidPk,
      pattern_id: { type: DataTypes.UUID, allowNull: false, references: { model: "patterns", key: "id" }, onDelete: "CASCADE" },
      reviewer_id: { type: DataTypes.UUID, allowNull: true, references: { model: "users", key: "id" }, onDelete: "SET NULL" },
      decision: { type: DataTypes.STRING(20), allowNull: false },
      comment: { type: DataTypes.TEXT, allowNull: true },
      ...timestamps,
    }, { transaction });
    await qi.sequelize.query(
      `ALTER TABLE pattern_reviews ADD CONSTRAINT pattern_reviews_decision_check CHECK (decision IN ('approve', 'request_changes'))`,
      { transaction });
    await qi.addIndex("pattern_reviews", ["pattern_id", "created_at"], { name: "pattern_reviews_pattern_created", transaction });
  });
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.dropTable("pattern_reviews", { transaction });
    await qi.dropTable("pattern_pieces", { transaction });
    await qi.dropTable("patterns", { transaction });
  });
};
