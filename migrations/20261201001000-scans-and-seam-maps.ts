import { DataTypes, literal } from "sequelize";
import type { Migration } from "@/lib/db/migrator";

/**
 * Scans (an uploaded OBJ/STL, its intake report and the S3 keys of the original, the viewer mesh and the lossless
 * intake copy) and seam maps (versioned seam lists per scan: a save adds a version, never overwrites one).
 */

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: literal("CURRENT_TIMESTAMP") },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: literal("CURRENT_TIMESTAMP") },
};
const uuidPk = { type: DataTypes.UUID, primaryKey: true, allowNull: false, defaultValue: literal("gen_random_uuid()") };

export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.createTable("scans", {
      id: uuidPk,
      shop_id: { type: DataTypes.UUID, allowNull: false, references: { model: "shops", key: "id" }, onDelete: "CASCADE" },
      project_id: { type: DataTypes.UUID, allowNull: false, references: { model: "projects", key: "id" }, onDelete: "CASCADE" },
      created_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: "users", key: "id" }, onDelete: "SET NULL" },
      name: { type: DataTypes.STRING(255), allowNull: false },
      units: { type: DataTypes.STRING(4), allowNull: false },
      status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "processing" },
      error: { type: DataTypes.TEXT, allowNull: true },
      format: { type: DataTypes.STRING(12), allowNull: true },
      byte_size: { type: DataTypes.BIGINT, allowNull: false },
      original_key: { type: DataTypes.STRING(255), allowNull: false },
      working_key: { type: DataTypes.STRING(255), allowNull: true },
      intake_key: { type: DataTypes.STRING(255), allowNull: true },
      report: { type: DataTypes.JSONB, allowNull: true },
      vertex_count: { type: DataTypes.INTEGER, allowNull: true },
      face_count: { type: DataTypes.INTEGER, allowNull: true },
      ...timestamps,
    }, { transaction });
    await qi.sequelize.query(
      `ALTER TABLE scans ADD CONSTRAINT scans_status_check CHECK (status IN ('processing', 'ready', 'failed'))`, { transaction });
    await qi.sequelize.query(
      `ALTER TABLE scans ADD CONSTRAINT scans_units_check CHECK (units IN ('mm', 'cm', 'm', 'in'))`, { transaction });
    await qi.addIndex("scans", ["project_id", "created_at"], { name: "scans_project_created", transaction });
    await qi.addIndex("scans", ["shop_id"], { name: "scans_shop_id", transaction });

    await qi.createTable("seam_maps", {
      id: uuidPk,
      scan_id: { type: DataTypes.UUID, allowNull: false, references: { model: "scans", key: "id" }, onDelete: "CASCADE" },
      created_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: "users", key: "id" }, onDelete: "SET NULL" },
      version: { type: DataTypes.INTEGER, allowNull: false },
      seams: { type: DataTypes.JSONB, allowNull: false },
      edge_count: { type: DataTypes.INTEGER, allowNull: false },
      pieces: { type: DataTypes.JSONB, allowNull: false },
      ...timestamps,
    }, { transaction });
    await qi.sequelize.query(`ALTER TABLE seam_maps ADD CONSTRAINT seam_maps_version_positive CHECK (version >= 1)`, { transaction });
    await qi.addIndex("seam_maps", ["scan_id", "version"], { unique: true, name: "seam_maps_scan_version_unique", transaction });
  });
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.dropTable("seam_maps", { transaction });
    await qi.dropTable("scans", { transaction });
  });
};
