import { openDatabase, DEFAULT_DATABASE_URL } from "../db/index";
import { seedDemo } from "../db/seed";
import { ensureLocalEnv } from "./local-env";

ensureLocalEnv();
const url = process.env.DATABASE_URL ?? DEFAULT_DATABASE_URL;
const { db, client } = openDatabase(url);
const counts = await seedDemo(db);
client.close();
console.log(`[trimrail] demo data seeded: ${JSON.stringify(counts)}`);
