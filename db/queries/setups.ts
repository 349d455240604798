import "server-only";
import { desc, eq, inArray } from "drizzle-orm";
import { getDb } from "@/db";
import { envelopeModels, setups, user } from "@/db/schema";
import type { SetupStatus } from "@/lib/domain";

export interface SetupListItem {
  id: string;
  name: string;
  status: SetupStatus;
  worstFlag: "ok" | "caution" | "stop" | null;
  modelName: string;
  ownerName: string;
  updatedAt: Date;
  submittedAt: Date | null;
}

const listColumns = {
  id: setups.id,
  name: setups.name,
  status: setups.status,
  worstFlag: setups.worstFlag,
  modelName: envelopeModels.name,
  ownerName: user.name,
  updatedAt: setups.updatedAt,
  submittedAt: setups.submittedAt,
};

/** A setup list row: the setup with its model's and its owner's names. */
function selectSetupList() {
  return getDb()
    .select(listColumns)
    .from(setups)
    .innerJoin(envelopeModels, eq(setups.modelId, envelopeModels.id))
    .innerJoin(user, eq(setups.ownerId, user.id));
}

export async function listSetupsForOwner({ ownerId }: { ownerId: string }): Promise<SetupListItem[]> {
  return selectSetupList()
    .where(eq(setups.ownerId, ownerId))
    .orderBy(desc(setups.updatedAt));
}

/** The review desk's queue: what customers have submitted, oldest first, and what was sent back. */
export async function listReviewQueue({
  statuses = ["submitted"],
}: { statuses?: SetupStatus[] } = {}): Promise<SetupListItem[]> {
  return selectSetupList()
    .where(inArray(setups.status, statuses))
    .orderBy(setups.submittedAt);
}
