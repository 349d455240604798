import { restoreDatabase } from "../db/backup";
import { DEFAULT_DATABASE_URL } from "../db/index";

// `npm run db:restore -- FILE`: put a backup back in place of the database (stop the app first).
const url = process.env.DATABASE_URL ?? DEFAULT_DATABASE_URL;
const from = process.argv[2];
if (!from) {
  console.error("Name the backup to restore: npm run db:restore -- data/backups/FILE.db");
  process.exit(2);
}
try {
  const { file } = await restoreDatabase({ url, from });
  console.log(`[trimrail] restored ${from} to ${file}; start the app again.`);
} catch (error) {
  console.error(`[trimrail] restore failed: ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
}
