import { defineConfig } from "vitest/config";
import path from "node:path";

const alias = { "@": path.resolve(import.meta.dirname) };

/**
 * Three projects: `unit` (pure logic, no services), `integration` (real PostgreSQL, Redis, S3 fake, SMTP fake
 * started by scripts/stack), `e2e` (Debian Chromium against a production build). `npm test` runs all three.
 */
export default defineConfig({
  resolve: { alias },
  test: {
    projects: [
      { resolve: { alias }, test: { name: "unit", include: ["tests/**/*.test.ts"], exclude: ["tests/integration/**", "tests/e2e/**"], testTimeout: 60_000 } },
      { resolve: { alias }, test: { name: "integration", include: ["tests/integration/**/*.test.ts"], testTimeout: 120_000, hookTimeout: 120_000, fileParallelism: false } },
      { resolve: { alias }, test: { name: "e2e", include: ["tests/e2e/**/*.test.ts"], testTimeout: 180_000, hookTimeout: 180_000, fileParallelism: false } },
    ],
  },
});
