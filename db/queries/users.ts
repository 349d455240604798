import "server-only";
import { asc, count, eq } from "drizzle-orm";
import { randomUUID } from "node:crypto";
import { getDb } from "@/db";
import { auditLog, user } from "@/db/schema";
import type { Role, UnitSystem } from "@/lib/domain";

export interface UserListItem {
  id: string;
  name: string;
  email: string;
  role: Role;
  createdAt: Date;
}

export async function listUsers(): Promise<UserListItem[]> {
  return getDb()
    .select({ id: user.id, name: user.name, email: user.email, role: user.role, createdAt: user.createdAt })
    .from(user)
    .orderBy(asc(user.role), asc(user.name));
}

/** A page of accounts by role then name, for the Workshop's people list. */
export async function listUsersPage({
  page,
  pageSize,
}: {
  page: number;
  pageSize: number;
}): Promise<{ rows: UserListItem[]; total: number; page: number; pageSize: number }> {
  const db = getDb();
  const [rows, [totals]] = await Promise.all([
    db
      .select({ id: user.id, name: user.name, email: user.email, role: user.role, createdAt: user.createdAt })
      .from(user)
      .orderBy(asc(user.role), asc(user.name), asc(user.id))
      .limit(pageSize)
      .offset((page - 1) * pageSize),
    db.select({ n: count() }).from(user),
  ]);
  return { rows, total: totals?.n ?? 0, page, pageSize };
}

/** Changes one account's role and records who did it; returns false when there is no such account. */
export async function setUserRole({ userId, role, actorId }: { userId: string; role: Role; actorId: string }): Promise<boolean> {
  return getDb().transaction(async (tx) => {
    const [before] = await tx.select({ role: user.role }).from(user).where(eq(user.id, userId));
    if (!before) return false;
    await tx.update(user).set({ role, updatedAt: new Date() }).where(eq(user.id, userId));
    await tx.insert(auditLog).values({
      id: randomUUID(),
      actorId,
      action: "user.role",
      entityType: "user",
      entityId: userId,
      detailJson: { from: before.role, to: role },
    });
    return true;
  });
}

export async function setUnitSystem({ userId, unitSystem }: { userId: string; unitSystem: UnitSystem }): Promise<void> {
  await getDb().update(user).set({ unitSystem, updatedAt: new Date() }).where(eq(user.id, userId));
}
