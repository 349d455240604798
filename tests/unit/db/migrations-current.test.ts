import { spawnSync } from "node:child_process";
import { cpSync, mkdtempSync, readdirSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { MIGRATIONS_FOLDER } from "@/db/migrate";

describe("db/migrations", () => {
  it("matches db/schema.ts: drizzle-kit generate finds nothing new to write", () => {
    const out = mkdtempSync(path.join(os.tmpdir(), "trimrail-migrations-"));
    try {
      cpSync(MIGRATIONS_FOLDER, out, { recursive: true });
      const before = readdirSync(out).sort();
      const run = spawnSync("npx", ["drizzle-kit", "generate", "--dialect", "sqlite", "--schema", "./db/schema.ts", "--out", out], {
        encoding: "utf8",
      });
      expect(run.status, run.stderr).toBe(0);
      expect(readdirSync(out).sort()).toEqual(before);
    } finally {
      rmSync(out, { recursive: true, force: true });
    }
  }, 60_000);
});
