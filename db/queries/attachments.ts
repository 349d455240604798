import "server-only";
import { and, asc, count, eq, inArray, sql } from "drizzle-orm";
import { getDb } from "@/db";
import { attachments, setups, type AttachmentRow } from "@/db/schema";
import { recordAudit } from "./audit";
import type { Tx } from "./setups";

// The files hung on a setup. Rows only: the bytes live in the object store under `storageKey`
// (lib/storage), and the core (lib/server/attachments.ts) keeps the two in step.

export async function listAttachmentsForSetup({ setupId }: { setupId: string }): Promise<AttachmentRow[]> {
  return getDb()
    .select()
    .from(attachments)
    .where(eq(attachments.setupId, setupId))
    .orderBy(asc(attachments.createdAt), asc(attachments.id));
}

export async function countAttachmentsForSetup({ setupId }: { setupId: string }): Promise<number> {
  const [{ n }] = await getDb().select({ n: count() }).from(attachments).where(eq(attachments.setupId, setupId));
  return n;
}

export async function getAttachmentById({ id }: { id: string }): Promise<AttachmentRow | null> {
  const [row] = await getDb().select().from(attachments).where(eq(attachments.id, id));
  return row ?? null;
}

export type InsertAttachmentOutcome = { kind: "inserted"; row: AttachmentRow } | { kind: "full" } | { kind: "no_setup" };

/**
 * Adds the row only while the setup is still the uploader's and holds fewer than `cap` files.
 * One INSERT … SELECT … WHERE decides both at once, so two uploads racing for the last place
 * cannot both win, and a setup deleted meanwhile takes no row.
 */
export async function insertAttachment({
  row,
  cap,
}: {
  row: Omit<AttachmentRow, "createdAt">;
  cap: number;
}): Promise<InsertAttachmentOutcome> {
  return getDb().transaction(async (tx) => {
    const written = await tx.run(sql`
      insert into attachments (id, setup_id, uploader_id, file_name, content_type, size_bytes, storage_key)
      select ${row.id}, ${row.setupId}, ${row.uploaderId}, ${row.fileName}, ${row.contentType}, ${row.sizeBytes}, ${row.storageKey}
      where exists (select 1 from setups where id = ${row.setupId} and owner_id = ${row.uploaderId})
        and (select count(*) from attachments where setup_id = ${row.setupId}) < ${cap}`);
    if (written.rowsAffected === 0) {
      const [setup] = await tx
        .select({ id: setups.id })
        .from(setups)
        .where(and(eq(setups.id, row.setupId), eq(setups.ownerId, row.uploaderId)));
      return setup ? { kind: "full" as const } : { kind: "no_setup" as const };
    }
    await recordAudit(tx, {
      actorId: row.uploaderId,
      action: "setup.attachment.add",
      entityType: "setup",
      entityId: row.setupId,
      detail: { fileName: row.fileName },
    });
    const [inserted] = await tx.select().from(attachments).where(eq(attachments.id, row.id));
    return { kind: "inserted" as const, row: inserted };
  });
}

/** Deletes the row of a file on the owner's setup; returns whether there was one. */
export async function deleteAttachment({ id, ownerId }: { id: string; ownerId: string }): Promise<boolean> {
  return getDb().transaction(async (tx) => {
    const owned = tx.select({ id: setups.id }).from(setups).where(eq(setups.ownerId, ownerId));
    const [deleted] = await tx
      .delete(attachments)
      .where(and(eq(attachments.id, id), inArray(attachments.setupId, owned)))
      .returning({ setupId: attachments.setupId, fileName: attachments.fileName });
    if (!deleted) return false;
    await recordAudit(tx, {
      actorId: ownerId,
      action: "setup.attachment.delete",
      entityType: "setup",
      entityId: deleted.setupId,
      detail: { fileName: deleted.fileName },
    });
    return true;
  });
}

/**
 * Inside the transaction that deletes a setup: deletes its attachment rows first (the write takes
 * the lock, so no upload can slip a row in between) and returns their storage keys, whose objects
 * the caller deletes once the transaction has committed.
 */
export async function deleteAttachmentRowsOfSetup(tx: Tx, { setupId, ownerId }: { setupId: string; ownerId: string }): Promise<string[]> {
  const owned = tx
    .select({ id: setups.id })
    .from(setups)
    .where(and(eq(setups.id, setupId), eq(setups.ownerId, ownerId)));
  const rows = await tx
    .delete(attachments)
    .where(and(eq(attachments.setupId, setupId), inArray(attachments.setupId, owned)))
    .returning({ storageKey: attachments.storageKey });
  return rows.map((r) => r.storageKey);
}
