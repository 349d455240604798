"use client";
import { useQuery, useQueryClient } from "@tanstack/react-query";
import { useId } from "react";
import { fetchAttachments } from "@/lib/client/api";
import { ATTACHMENTS_PER_SETUP_MAX, type AttachmentView } from "@/lib/domain";
import { AttachmentTile } from "./attachment-tile";
import { FileDrop } from "./file-drop";
import { UploadRow } from "./upload-row";
import { attachmentsQueryKey, useAttachmentUploads } from "./use-attachment-uploads";

interface AttachmentsPanelProps {
  setupId: string;
  /** The list as the server rendered it, so it shows before any request. */
  initialAttachments: AttachmentView[];
  /** The owner adds and deletes; review staff only look. */
  canEdit?: boolean;
  title?: string;
}

/** Photos and datasheets of a setup's payload: thumbnails that open the file, and (for the owner) uploads. */
export function AttachmentsPanel({ setupId, initialAttachments, canEdit = false, title = "Photos and datasheets" }: AttachmentsPanelProps) {
  const client = useQueryClient();
  const key = attachmentsQueryKey(setupId);
  const list = useQuery({ queryKey: key, queryFn: () => fetchAttachments(setupId), initialData: { attachments: initialAttachments } });
  const attachments = list.data.attachments;
  const uploads = useAttachmentUploads(setupId, attachments.length);
  const titleId = useId();
  const full = attachments.length >= ATTACHMENTS_PER_SETUP_MAX;
  return (
    <section className="panel space-y-3 p-4" aria-labelledby={titleId} data-testid="attachments">
      <div className="flex items-baseline justify-between gap-2">
        <h2 id={titleId} className="text-lg">
          {title}
        </h2>
        <span className="figure text-sm text-muted" data-testid="attachment-count">
          {attachments.length} of {ATTACHMENTS_PER_SETUP_MAX}
        </span>
      </div>
      {canEdit && <FileDrop onFiles={uploads.add} disabled={full} />}
      {uploads.items.length > 0 && (
        <ul className="space-y-2" aria-label="Files being added" aria-live="polite">
          {uploads.items.map((item) => (
            <UploadRow key={item.key} item={item} onDismiss={uploads.dismiss} />
          ))}
        </ul>
      )}
      {attachments.length === 0 ? (
        <p className="text-sm text-muted">
          {canEdit
            ? "No files yet. A photo of the payload on its mount and its datasheet help support review the setup."
            : "The customer has attached no files."}
        </p>
      ) : (
        <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3 xl:grid-cols-4">
          {attachments.map((a) => (
            <AttachmentTile key={a.id} attachment={a} canDelete={canEdit} onDeleted={() => client.invalidateQueries({ queryKey: key })} />
          ))}
        </ul>
      )}
    </section>
  );
}
