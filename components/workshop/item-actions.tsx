"use client";
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { deleteCatalogueItemRequest, setCatalogueActiveRequest, type CatalogueKindPath } from "@/lib/client/api";

interface ItemActionsProps {
  kind: CatalogueKindPath;
  id: string;
  name: string;
  active: boolean;
  setupCount: number;
  /** Where to go after a delete (an item's own page no longer exists). */
  afterDelete?: string;
}

/**
 * Retire or restore an item, or delete one no setup uses. Retiring hides it from new setups while
 * every setup that names it keeps working; deleting asks first.
 */
export function ItemActions({ kind, id, name, active, setupCount, afterDelete }: ItemActionsProps) {
  const router = useRouter();
  const toggle = useMutation({ mutationFn: () => setCatalogueActiveRequest(kind, id, !active), onSuccess: () => router.refresh() });
  const remove = useMutation({
    mutationFn: () => deleteCatalogueItemRequest(kind, id),
    onSuccess: () => (afterDelete ? router.push(afterDelete) : router.refresh()),
  });
  const error = toggle.error?.message ?? remove.error?.message ?? null;
  return (
    <span className="inline-flex flex-wrap items-center gap-2">
      <button
        type="button"
        onClick={() => toggle.mutate()}
        disabled={toggle.isPending}
        className="rounded border border-hairline bg-white px-2 py-0.5 text-sm"
        aria-label={`${active ? "Retire" : "Restore"} ${name}`}
        data-testid="item-toggle-active"
      >
        {active ? "Retire" : "Restore"}
      </button>
      {setupCount === 0 && (
        <button
          type="button"
          onClick={() => {
            if (window.confirm(`Delete ${name}? No setup uses it; this cannot be undone.`)) remove.mutate();
          }}
          disabled={remove.isPending}
          className="rounded border border-hairline bg-white px-2 py-0.5 text-sm text-flag-stop"
          aria-label={`Delete ${name}`}
          data-testid="item-delete"
        >
          Delete
        </button>
      )}
      {error && (
        <span className="text-xs text-flag-stop" role="alert">
          {error}
        </span>
      )}
    </span>
  );
}

/** "active" or "retired", by word first (look.md: never by colour alone). */
export function ActiveBadge({ active }: { active: boolean }) {
  return active ? (
    <span className="text-sm">in catalogue</span>
  ) : (
    <span className="rounded bg-paper px-1.5 py-0.5 text-sm text-muted" data-testid="retired-badge">
      retired
    </span>
  );
}
