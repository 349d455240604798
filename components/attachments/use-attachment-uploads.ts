"use client";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useCallback, useEffect, useRef, useState } from "react";
import { uploadAttachmentRequest } from "@/lib/client/api";
import { ATTACHMENT_MAX_BYTES, ATTACHMENTS_PER_SETUP_MAX } from "@/lib/domain";
import { formatFileSize } from "./file-size";

export type UploadState = "waiting" | "uploading" | "failed";

export interface UploadItem {
  key: number;
  file: File;
  state: UploadState;
  loadedBytes: number;
  totalBytes: number;
  error: string | null;
}

export const attachmentsQueryKey = (setupId: string) => ["attachments", setupId] as const;

/**
 * The Planner's upload queue: files go one at a time, each with its own progress; a file that
 * cannot be sent (too large, no room left) fails at once with the reason, before any byte is sent.
 * The server checks all of it again, and its refusal (e.g. a wrong type) shows on the file's row.
 */
export function useAttachmentUploads(setupId: string, storedCount: number) {
  const client = useQueryClient();
  const [items, setItems] = useState<UploadItem[]>([]);
  const nextKey = useRef(1);
  const update = useCallback(
    (key: number, change: Partial<UploadItem>) => setItems((all) => all.map((i) => (i.key === key ? { ...i, ...change } : i))),
    [],
  );
  const upload = useMutation({
    mutationFn: (item: UploadItem) =>
      uploadAttachmentRequest(setupId, item.file, {
        onProgress: (p) => update(item.key, { loadedBytes: p.loadedBytes, totalBytes: p.totalBytes }),
      }),
    onSuccess: (_view, item) => {
      setItems((all) => all.filter((i) => i.key !== item.key));
      return client.invalidateQueries({ queryKey: attachmentsQueryKey(setupId) });
    },
    onError: (error, item) => update(item.key, { state: "failed", error: error.message }),
  });

  // One at a time, in the order they were chosen.
  const { mutate, isPending } = upload;
  useEffect(() => {
    if (isPending || items.some((i) => i.state === "uploading")) return;
    const next = items.find((i) => i.state === "waiting");
    if (!next) return;
    // Starting the next upload is the effect's side effect; its row shows "uploading" at once.
    // eslint-disable-next-line react-hooks/set-state-in-effect
    update(next.key, { state: "uploading" });
    mutate({ ...next, state: "uploading" });
  }, [items, isPending, mutate, update]);

  const add = useCallback(
    (files: File[]) => {
      setItems((all) => {
        let room = ATTACHMENTS_PER_SETUP_MAX - storedCount - all.filter((i) => i.state !== "failed").length;
        const added = files.map((file): UploadItem => {
          const base = { key: nextKey.current++, file, loadedBytes: 0, totalBytes: file.size };
          if (file.size > ATTACHMENT_MAX_BYTES)
            return {
              ...base,
              state: "failed",
              error: `This file is ${formatFileSize(file.size)}; a file may be at most ${formatFileSize(ATTACHMENT_MAX_BYTES)}.`,
            };
          if (room <= 0)
            return {
              ...base,
              state: "failed",
              error: `A setup holds at most ${ATTACHMENTS_PER_SETUP_MAX} files; delete one before adding another.`,
            };
          room -= 1;
          return { ...base, state: "waiting", error: null };
        });
        return [...all, ...added];
      });
    },
    [storedCount],
  );
  const dismiss = useCallback((key: number) => setItems((all) => all.filter((i) => i.key !== key)), []);
  return { items, add, dismiss };
}
