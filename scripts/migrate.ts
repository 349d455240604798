import { mkdirSync } from "node:fs";
import { openDatabase, DEFAULT_DATABASE_URL } from "../db/index";
import { migrateDatabase } from "../db/migrate";
import { ensureLocalEnv } from "./local-env";

ensureLocalEnv();
const url = process.env.DATABASE_URL ?? DEFAULT_DATABASE_URL;
if (url.startsWith("file:./data/")) mkdirSync("data", { recursive: true });
const { db, client } = openDatabase(url);
await migrateDatabase(db);
client.close();
console.log(`[trimrail] database migrated: ${url}`);
