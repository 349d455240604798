import { formatFileSize } from "./file-size";
import type { UploadItem } from "./use-attachment-uploads";

interface UploadRowProps {
  item: UploadItem;
  onDismiss: (key: number) => void;
}

/** One file on its way: its name, a progress bar with an accessible name and value, or why it failed. */
export function UploadRow({ item, onDismiss }: UploadRowProps) {
  const percent = item.totalBytes > 0 ? Math.min(100, Math.round((item.loadedBytes / item.totalBytes) * 100)) : 0;
  const name = item.file.name || "file";
  return (
    <li className="rounded border border-hairline bg-white p-2 text-sm" data-testid="upload-row" data-state={item.state}>
      <div className="flex items-baseline justify-between gap-2">
        <span className="min-w-0 truncate font-medium" title={name}>
          {name}
        </span>
        <span className="figure shrink-0 text-muted">{formatFileSize(item.file.size)}</span>
      </div>
      {item.state === "failed" ? (
        <div className="mt-1 flex items-start justify-between gap-2">
          <p role="alert" className="text-flag-stop" data-testid="upload-error">
            Not added: {item.error}
          </p>
          <button
            type="button"
            className="shrink-0 underline"
            onClick={() => onDismiss(item.key)}
            aria-label={`Dismiss the message about ${name}`}
          >
            Dismiss
          </button>
        </div>
      ) : (
        <div className="mt-1 flex items-center gap-2">
          <div
            role="progressbar"
            aria-label={`Uploading ${name}`}
            aria-valuemin={0}
            aria-valuemax={100}
            aria-valuenow={percent}
            aria-valuetext={
              item.state === "waiting"
                ? "waiting"
                : `${percent} %, ${formatFileSize(item.loadedBytes)} of ${formatFileSize(item.totalBytes)}`
            }
            className="h-2 flex-1 overflow-hidden rounded-full bg-hairline"
            data-testid="upload-progress"
          >
            <div className="h-full rounded-full bg-accent transition-[width]" style={{ width: `${percent}%` }} />
          </div>
          <span className="figure w-20 shrink-0 text-right text-muted">{item.state === "waiting" ? "waiting" : `${percent} %`}</span>
        </div>
      )}
    </li>
  );
}
