import { mkdirSync } from "node:fs";
import path from "node:path";
import { backupDatabase } from "../db/backup";
import { DEFAULT_DATABASE_URL } from "../db/index";

// `npm run db:backup [-- FILE]`: a consistent copy of the live database (default data/backups/<time>.db).
const url = process.env.DATABASE_URL ?? DEFAULT_DATABASE_URL;
const to = process.argv[2] ?? path.join("data", "backups", `trimrail-${new Date().toISOString().replace(/[:.]/g, "-")}.db`);
mkdirSync(path.dirname(path.resolve(to)), { recursive: true });
try {
  const { file } = await backupDatabase({ url, to });
  console.log(`[trimrail] backed up ${url} to ${file}`);
} catch (error) {
  console.error(`[trimrail] backup failed: ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
}
