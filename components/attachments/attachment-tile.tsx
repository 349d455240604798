"use client";
import { useMutation } from "@tanstack/react-query";
import { useState } from "react";
import { deleteAttachmentRequest } from "@/lib/client/api";
import type { AttachmentView } from "@/lib/domain";
import { formatFileSize } from "./file-size";

interface AttachmentTileProps {
  attachment: AttachmentView;
  canDelete?: boolean;
  onDeleted?: () => void;
}

function DocumentGlyph() {
  return (
    <svg viewBox="0 0 48 60" className="h-16 w-14" aria-hidden="true">
      <path d="M4 2h28l12 12v44H4z" fill="white" stroke="#5f6670" strokeWidth="2" />
      <path d="M32 2v12h12" fill="none" stroke="#5f6670" strokeWidth="2" />
      <text x="24" y="42" textAnchor="middle" fontSize="12" fontWeight="700" fill="#14202e" fontFamily="ui-sans-serif, system-ui">
        PDF
      </text>
    </svg>
  );
}

/** A photo's thumbnail or a datasheet's glyph, linking to the file, with its name and size. */
export function AttachmentTile({ attachment, canDelete = false, onDeleted }: AttachmentTileProps) {
  const [confirming, setConfirming] = useState(false);
  const remove = useMutation({ mutationFn: () => deleteAttachmentRequest(attachment.id), onSuccess: onDeleted });
  const isPdf = attachment.kind === "pdf";
  return (
    <li className="flex flex-col rounded border border-hairline bg-white" data-testid="attachment" data-kind={attachment.kind}>
      <a
        href={attachment.url}
        {...(isPdf ? { download: attachment.fileName } : { target: "_blank", rel: "noopener" })}
        className="flex h-32 items-center justify-center overflow-hidden rounded-t bg-paper"
        aria-label={isPdf ? `Download ${attachment.fileName}` : `Open ${attachment.fileName} full size`}
        data-testid="attachment-link"
      >
        {attachment.thumbnailUrl ? (
          // Thumbnails come from our own route at a fixed size; next/image would only re-encode them.
          // eslint-disable-next-line @next/next/no-img-element
          <img
            src={attachment.thumbnailUrl}
            alt={attachment.fileName}
            className="max-h-full max-w-full object-contain"
            loading="lazy"
            data-testid="attachment-thumbnail"
          />
        ) : (
          <DocumentGlyph />
        )}
      </a>
      <div className="flex flex-1 flex-col gap-1 p-2 text-sm">
        <span className="truncate font-medium" title={attachment.fileName} data-testid="attachment-name">
          {attachment.fileName}
        </span>
        <span className="figure text-muted">
          {isPdf ? "PDF" : "Photo"} · {formatFileSize(attachment.sizeBytes)}
        </span>
        {canDelete &&
          (confirming ? (
            <span className="flex flex-wrap items-center gap-1" role="group" aria-label={`Confirm deleting ${attachment.fileName}`}>
              <button
                type="button"
                disabled={remove.isPending}
                className="rounded bg-flag-stop px-2 py-0.5 text-white"
                onClick={() => remove.mutate()}
                data-testid="attachment-confirm-delete"
              >
                Delete
              </button>
              <button type="button" className="underline" onClick={() => setConfirming(false)}>
                Keep
              </button>
            </span>
          ) : (
            <button
              type="button"
              className="self-start text-flag-stop underline"
              onClick={() => setConfirming(true)}
              aria-label={`Delete ${attachment.fileName}`}
              data-testid="attachment-delete"
            >
              Delete
            </button>
          ))}
        {remove.error && (
          <span role="alert" className="text-flag-stop">
            {remove.error.message}
          </span>
        )}
      </div>
    </li>
  );
}
