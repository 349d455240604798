import "server-only";
import { checkDatabaseHealth, type DatabaseHealth } from "@/db/health";
import { fail, ok, type Result } from "@/lib/errors";

/** The server's readiness: 200 while the database is open, writable and migrated; 503 otherwise. */
export async function getHealth(): Promise<Result<{ status: "ok"; database: DatabaseHealth }>> {
  const database = await checkDatabaseHealth();
  if (database.state !== "ready") return { ok: false, error: { ...fail("unavailable", database.message).error, detail: { database } } };
  return ok({ status: "ok", database });
}
