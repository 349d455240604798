"use client";
import { useState } from "react";
import { formatQuantity } from "@/lib/units";
import type { SetupPayloadDraft } from "@/lib/setups/setup-draft";
import { BLANK_PAYLOAD, PayloadForm } from "./payload-form";
import { usePlanner, usePlannerActions } from "./planner-context";
import { Section } from "./section";
import { isOffered } from "./types";

type Editing = { mode: "add"; initial: SetupPayloadDraft } | { mode: "edit"; index: number } | null;

export function PayloadsSection() {
  const payloads = usePlanner((s) => s.draft.payloads);
  const catalogue = usePlanner((s) => s.catalogue);
  const units = usePlanner((s) => s.unitSystem);
  const actions = usePlannerActions();
  // Retired templates and adapters stay for the payloads that already name them, never as new choices.
  const templates = catalogue.templates.filter((t) => t.active !== false);
  const adaptersFor = (adapterId: string | null) => catalogue.adapters.filter((a) => isOffered(a, a.id === adapterId));
  const [templateId, setTemplateId] = useState(templates[0]?.id ?? "");
  const [editing, setEditing] = useState<Editing>(null);

  const addTemplate = () => {
    const tpl = templates.find((t) => t.id === templateId);
    if (!tpl) return;
    const { id, description: _description, active: _active, ...fields } = tpl;
    actions.addPayload({ ...fields, templateId: id, adapterId: null });
  };

  return (
    <Section title={`Payloads (${payloads.length})`} testId="section-payloads">
      <ul className="divide-y divide-hairline" data-testid="payload-list">
        {payloads.map((p, i) => (
          <li key={`${p.name}-${i}`} className="py-2" data-testid="payload-item">
            <div className="flex flex-wrap items-center gap-2 text-sm">
              <span className="font-medium">{p.name}</span>
              <span className="figure text-muted">{formatQuantity("itemMass", p.massKg, units)}</span>
              <span className="text-muted">{p.attachment}{p.adapterId ? " + adapter" : ""}</span>
              <span className="ml-auto flex gap-2">
                <button type="button" className="text-accent underline" onClick={() => setEditing({ mode: "edit", index: i })}>Edit</button>
                <button type="button" className="text-flag-stop underline" onClick={() => actions.removePayload(i)} aria-label={`Remove ${p.name}`}>Remove</button>
              </span>
            </div>
            {editing?.mode === "edit" && editing.index === i && (
              <PayloadForm
                initial={p}
                units={units}
                adapters={adaptersFor(p.adapterId)}
                submitLabel="Apply"
                onSubmit={(next) => {
                  actions.updatePayload(i, next);
                  setEditing(null);
                }}
                onCancel={() => setEditing(null)}
              />
            )}
          </li>
        ))}
        {payloads.length === 0 && <li className="py-2 text-sm text-muted">No payloads yet: the mount hangs empty.</li>}
      </ul>
      <div className="mt-3 flex flex-wrap items-end gap-2">
        <label className="text-sm text-muted">
          From the catalogue
          <select value={templateId} onChange={(e) => setTemplateId(e.target.value)} className="mt-0.5 block rounded border border-hairline bg-white px-2 py-1" data-testid="template-select">
            {templates.map((t) => (
              <option key={t.id} value={t.id}>{t.name} ({formatQuantity("itemMass", t.massKg, units)})</option>
            ))}
          </select>
        </label>
        <button type="button" onClick={addTemplate} className="rounded border border-accent px-3 py-1.5 text-sm text-accent" data-testid="add-template">Add</button>
        <button type="button" onClick={() => setEditing({ mode: "add", initial: BLANK_PAYLOAD })} className="rounded border border-hairline px-3 py-1.5 text-sm" data-testid="add-custom">Custom payload…</button>
      </div>
      {editing?.mode === "add" && (
        <PayloadForm
          initial={editing.initial}
          units={units}
          adapters={adaptersFor(null)}
          submitLabel="Add payload"
          onSubmit={(p) => {
            actions.addPayload(p);
            setEditing(null);
          }}
          onCancel={() => setEditing(null)}
        />
      )}
    </Section>
  );
}
