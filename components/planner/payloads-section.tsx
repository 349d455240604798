"use client";
import dynamic from "next/dynamic";
import { useEffect, useRef, useState } from "react";
import { formatQuantity } from "@/lib/units";
import type { SetupPayloadDraft } from "@/lib/setups/setup-draft";
import { usePlanner, usePlannerActions, usePlannerStoreApi } from "./planner-context";
import { Section } from "./section";
import { isOffered } from "./types";

// The form (and its form library) is only needed once someone adds or edits a payload; pointing at
// a button that opens it starts the download.
const loadPayloadForm = () => import("./payload-form");
const PayloadForm = dynamic(() => loadPayloadForm().then((module) => module.PayloadForm), {
  ssr: false,
  loading: () => (
    <p className="mt-3 text-sm text-muted" role="status">
      Loading the form…
    </p>
  ),
});

const BLANK_PAYLOAD: SetupPayloadDraft = {
  templateId: null,
  name: "",
  category: "other",
  massKg: 0.1,
  shape: "box",
  lengthM: 0.08,
  widthM: 0.06,
  heightM: 0.05,
  attachment: "1/4-20 UNC",
  adapterId: null,
  dragAreaM2: 0.003,
  offsetXM: 0,
  offsetZM: -0.075,
};

/**
 * How long the offer to undo a Remove stays when nothing else is edited: long enough to notice and
 * reach it by keyboard or screen reader (WCAG 2.2.1 asks for time enough), short enough not to linger.
 */
export const UNDO_OFFER_MS = 60_000;

/** A Remove that can still be undone: the payload, its place, and the draft right after it went. */
interface Removed {
  payload: SetupPayloadDraft;
  index: number;
  draftAfter: unknown;
}

type Editing = { mode: "add"; initial: SetupPayloadDraft } | { mode: "edit"; index: number } | null;

export function PayloadsSection() {
  const draft = usePlanner((s) => s.draft);
  const payloads = draft.payloads;
  const store = usePlannerStoreApi();
  const catalogue = usePlanner((s) => s.catalogue);
  const units = usePlanner((s) => s.unitSystem);
  const actions = usePlannerActions();
  // Retired templates and adapters stay for the payloads that already name them, never as new choices.
  const templates = catalogue.templates.filter((t) => t.active !== false);
  const adaptersFor = (adapterId: string | null) => catalogue.adapters.filter((a) => isOffered(a, a.id === adapterId));
  const [templateId, setTemplateId] = useState(templates[0]?.id ?? "");
  const [editing, setEditing] = useState<Editing>(null);
  // After Apply, Add payload or Remove the button pressed is gone: focus goes to the list instead of the page body.
  const listRef = useRef<HTMLUListElement>(null);
  const focusList = () => listRef.current?.focus();

  const [removed, setRemoved] = useState<Removed | null>(null);
  const undoRef = useRef<HTMLButtonElement>(null);
  const remove = (index: number) => {
    const payload = actions.removePayload(index);
    if (payload) setRemoved({ payload, index, draftAfter: store.getState().draft });
  };
  // Focus goes to the offer as it appears: the Remove button pressed is gone.
  useEffect(() => {
    if (removed) undoRef.current?.focus();
  }, [removed]);
  // The offer lasts until the next edit of the setup (any new draft), or the timeout.
  const offer = removed && draft === removed.draftAfter ? removed : null;
  useEffect(() => {
    if (!removed) return;
    const timer = setTimeout(() => {
      if (document.activeElement === undoRef.current) focusList();
      setRemoved(null);
    }, UNDO_OFFER_MS);
    return () => clearTimeout(timer);
  }, [removed]);
  const undo = () => {
    if (!offer) return;
    actions.insertPayload(offer.index, offer.payload);
    setRemoved(null);
    focusList();
  };

  const addTemplate = () => {
    const tpl = templates.find((t) => t.id === templateId);
    if (!tpl) return;
    const { id, description: _description, active: _active, ...fields } = tpl;
    actions.addPayload({ ...fields, templateId: id, adapterId: null });
  };

  return (
    <Section title={`Payloads (${payloads.length})`} testId="section-payloads">
      <ul ref={listRef} tabIndex={-1} className="divide-y divide-hairline" data-testid="payload-list">
        {payloads.map((p, i) => (
          <li key={`${p.name}-${i}`} className="py-2" data-testid="payload-item">
            <div className="flex flex-wrap items-center gap-2 text-sm">
              <span className="font-medium">{p.name}</span>
              <span className="figure text-muted">{formatQuantity("itemMass", p.massKg, units)}</span>
              <span className="text-muted">
                {p.attachment}
                {p.adapterId ? " + adapter" : ""}
              </span>
              <span className="ml-auto flex gap-2">
                <button
                  type="button"
                  className="text-accent underline"
                  onPointerEnter={loadPayloadForm}
                  onFocus={loadPayloadForm}
                  onClick={() => setEditing({ mode: "edit", index: i })}
                >
                  Edit
                </button>
                <button type="button" className="text-flag-stop underline" onClick={() => remove(i)} aria-label={`Remove ${p.name}`}>
                  Remove
                </button>
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
                  focusList();
                }}
                onCancel={() => setEditing(null)}
              />
            )}
          </li>
        ))}
        {payloads.length === 0 && <li className="py-2 text-sm text-muted">No payloads yet: the mount hangs empty.</li>}
      </ul>
      {/* A live region present from the start, so that the words are announced when they appear. */}
      <div role="status" className="text-sm" data-testid="payload-undo">
        {offer && (
          <p className="mt-2 flex flex-wrap items-center gap-2 rounded border border-hairline bg-paper px-3 py-1.5">
            Removed {offer.payload.name}.
            <button ref={undoRef} type="button" className="font-medium text-accent underline" onClick={undo} data-testid="undo-remove">
              Undo
            </button>
          </p>
        )}
      </div>
      <div className="mt-3 flex flex-wrap items-end gap-2">
        <label className="text-sm text-muted">
          From the catalogue
          <select
            value={templateId}
            onChange={(e) => setTemplateId(e.target.value)}
            className="mt-0.5 block rounded border border-hairline bg-white px-2 py-1"
            data-testid="template-select"
          >
            {templates.map((t) => (
              <option key={t.id} value={t.id}>
                {t.name} ({formatQuantity("itemMass", t.massKg, units)})
              </option>
            ))}
          </select>
        </label>
        <button
          type="button"
          onClick={addTemplate}
          className="rounded border border-accent px-3 py-1.5 text-sm text-accent"
          data-testid="add-template"
        >
          Add
        </button>
        <button
          type="button"
          onPointerEnter={loadPayloadForm}
          onFocus={loadPayloadForm}
          onClick={() => setEditing({ mode: "add", initial: BLANK_PAYLOAD })}
          className="rounded border border-hairline px-3 py-1.5 text-sm"
          data-testid="add-custom"
        >
          Custom payload…
        </button>
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
            focusList();
          }}
          onCancel={() => setEditing(null)}
        />
      )}
    </Section>
  );
}
