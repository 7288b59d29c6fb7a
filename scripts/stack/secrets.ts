import { randomBytes } from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { z } from "zod";

/**
 * Secrets of one local stack, generated on first start and kept in <dataDir>/secrets.json (mode 600). The data
 * folder is git-ignored, so they are never committed; deleting the file together with the data folder resets them.
 */
const secretsSchema = z.object({
  nextauthSecret: z.string().min(32),
  pgPassword: z.string().min(16),
  redisPassword: z.string().min(16),
});

export type StackSecrets = z.infer<typeof secretsSchema>;

function token(bytes: number): string {
  return randomBytes(bytes).toString("base64url");
}

export function loadOrCreateSecrets(dataDir: string): { secrets: StackSecrets; created: boolean } {
  const file = path.join(dataDir, "secrets.json");
  if (fs.existsSync(file)) {
    const parsed = secretsSchema.safeParse(JSON.parse(fs.readFileSync(file, "utf8")));
    if (!parsed.success) {
      throw new Error(`${file} is not a valid secrets file (${parsed.error.issues[0]?.message}); delete the data folder to start over`);
    }
    fs.chmodSync(file, 0o600);
    return { secrets: parsed.data, created: false };
  }
  const secrets: StackSecrets = { nextauthSecret: token(32), pgPassword: token(18), redisPassword: token(18) };
  fs.mkdirSync(dataDir, { recursive: true });
  const tmp = `${file}.${process.pid}.tmp`;
  fs.writeFileSync(tmp, JSON.stringify(secrets, null, 2) + "\n", { mode: 0o600 });
  fs.renameSync(tmp, file);
  return { secrets, created: true };
}
