"use client";
import { useEffect, useState } from "react";
import { FLAG_LEVELS, SETUP_STATUSES, STATUS_WORDS } from "@/lib/domain";
import type { QueueParams } from "./queue-params";

interface QueueFiltersProps {
  params: QueueParams;
  models: { id: string; name: string }[];
  onChange: (next: Partial<QueueParams>) => void;
}

const field = "mt-0.5 block rounded border border-hairline bg-white px-2 py-1 text-ink";

export function QueueFilters({ params, models, onChange }: QueueFiltersProps) {
  // The search box waits for a pause in typing before it asks the server.
  const [text, setText] = useState(params.q);
  // The URL changed from elsewhere (back button, a link): show its search, during render.
  const [lastQ, setLastQ] = useState(params.q);
  if (params.q !== lastQ) {
    setLastQ(params.q);
    setText(params.q);
  }
  useEffect(() => {
    if (text === params.q) return;
    const timer = setTimeout(() => onChange({ q: text.trim() }), 300);
    return () => clearTimeout(timer);
  }, [text, params.q, onChange]);

  return (
    <form
      role="search"
      className="flex flex-wrap items-end gap-3 text-sm text-muted"
      onSubmit={(e) => {
        e.preventDefault();
        onChange({ q: text.trim() });
      }}
    >
      <label>
        Search setup or customer
        <input
          type="search"
          className={`${field} w-56`}
          value={text}
          maxLength={120}
          onChange={(e) => setText(e.target.value)}
          data-testid="queue-search"
        />
      </label>
      <label>
        Status
        <select
          className={field}
          value={params.status}
          onChange={(e) => onChange({ status: e.target.value as QueueParams["status"] })}
          data-testid="queue-status"
        >
          {SETUP_STATUSES.filter((s) => s !== "draft").map((s) => (
            <option key={s} value={s}>
              {STATUS_WORDS[s]}
            </option>
          ))}
          <option value="any">any reviewed or waiting</option>
        </select>
      </label>
      <label>
        Worst flag
        <select
          className={field}
          value={params.worst}
          onChange={(e) => onChange({ worst: e.target.value as QueueParams["worst"] })}
          data-testid="queue-worst"
        >
          <option value="">any</option>
          {FLAG_LEVELS.map((l) => (
            <option key={l} value={l}>
              {l}
            </option>
          ))}
        </select>
      </label>
      <label>
        Envelope
        <select className={field} value={params.model} onChange={(e) => onChange({ model: e.target.value })} data-testid="queue-model">
          <option value="">any</option>
          {models.map((m) => (
            <option key={m.id} value={m.id}>
              {m.name}
            </option>
          ))}
        </select>
      </label>
    </form>
  );
}
