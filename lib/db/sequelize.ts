import { Sequelize } from "sequelize";
import { databaseUrl } from "@/lib/db/database-url";
import { initModels } from "@/models";

/**
 * The one Sequelize instance of the process, created on first use from DATABASE_URL, with every model initialised.
 * Lazy on purpose: importing this module (route handlers do) never touches the database or the environment.
 */
let instance: Sequelize | null = null;

export function getSequelize(): Sequelize {
  if (!instance) {
    instance = new Sequelize(databaseUrl(), {
      dialect: "postgres",
      logging: false,
      pool: { max: 5, min: 0, idle: 10_000 },
      define: { underscored: true },
    });
    initModels(instance);
  }
  return instance;
}

/** Closes the pool (scripts, tests). The next getSequelize() opens a new one. */
export async function closeSequelize(): Promise<void> {
  if (instance) {
    const s = instance;
    instance = null;
    await s.close();
  }
}
