import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { randomUUID } from "node:crypto";
import { getDb } from "@/db";
import { auditLog, user } from "@/db/schema";
import type { Tx } from "./setups";

export type AuditEntityType = "setup" | "user" | "envelope_model" | "envelope_unit" | "mount" | "adapter" | "payload_template";

/** One line of the audit log, written in the transaction of the change it records. */
export async function recordAudit(
  tx: Tx,
  entry: { actorId: string; action: string; entityType: AuditEntityType; entityId: string; detail?: Record<string, unknown> },
): Promise<void> {
  await tx.insert(auditLog).values({
    id: randomUUID(),
    actorId: entry.actorId,
    action: entry.action,
    entityType: entry.entityType,
    entityId: entry.entityId,
    detailJson: entry.detail ?? {},
  });
}

export interface HistoryEntry {
  at: Date;
  action: string;
  actorName: string | null;
  detail: Record<string, unknown>;
}

/** A setup's audit entries, oldest first, with who made each. */
export async function listSetupHistory({ setupId }: { setupId: string }): Promise<HistoryEntry[]> {
  const rows = await getDb()
    .select({ at: auditLog.createdAt, action: auditLog.action, actorName: user.name, detail: auditLog.detailJson })
    .from(auditLog)
    .leftJoin(user, eq(auditLog.actorId, user.id))
    .where(and(eq(auditLog.entityType, "setup"), eq(auditLog.entityId, setupId)))
    .orderBy(asc(auditLog.createdAt), asc(auditLog.id));
  return rows;
}
