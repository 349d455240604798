"use client";
import { useId, useRef, useState, type DragEvent } from "react";
import { ATTACHMENT_ACCEPT, ATTACHMENT_RULES_TEXT } from "@/lib/domain";

interface FileDropProps {
  onFiles: (files: File[]) => void;
  disabled?: boolean;
}

/** Where files are dropped, or picked with the system's file chooser (the button, for keyboard and touch). */
export function FileDrop({ onFiles, disabled = false }: FileDropProps) {
  const input = useRef<HTMLInputElement>(null);
  const [over, setOver] = useState(false);
  const hintId = useId();
  const take = (list: FileList | null) => {
    if (list && list.length > 0) onFiles([...list]);
  };
  const onDrop = (event: DragEvent) => {
    event.preventDefault();
    setOver(false);
    if (!disabled) take(event.dataTransfer.files);
  };
  return (
    <div
      className={`rounded-md border-2 border-dashed p-4 text-center text-sm ${over ? "border-accent bg-paper" : "border-hairline"}`}
      onDragOver={(event) => {
        event.preventDefault();
        if (!disabled) setOver(true);
      }}
      onDragLeave={() => setOver(false)}
      onDrop={onDrop}
      data-testid="attachment-drop"
    >
      <p>
        Drop photos or datasheets here, or{" "}
        <button
          type="button"
          className="font-medium text-accent underline disabled:text-muted"
          disabled={disabled}
          onClick={() => input.current?.click()}
          aria-describedby={hintId}
        >
          choose files
        </button>
      </p>
      <p id={hintId} className="mt-1 text-muted">
        {ATTACHMENT_RULES_TEXT}
      </p>
      <input
        ref={input}
        type="file"
        multiple
        accept={ATTACHMENT_ACCEPT}
        className="sr-only"
        tabIndex={-1}
        aria-hidden="true"
        disabled={disabled}
        data-testid="attachment-input"
        onChange={(event) => {
          take(event.currentTarget.files);
          event.currentTarget.value = "";
        }}
      />
    </div>
  );
}
