"use client";
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useMemo, useState } from "react";
import { useForm, type FieldValues } from "react-hook-form";
import { ApiError, saveCatalogueItemRequest } from "@/lib/client/api";
import type { UnitSystem } from "@/lib/domain";
import { formatQuantity, type Quantity } from "@/lib/units";
import { applyServerIssues, NumberField, SelectField, TextField } from "./form-fields";
import { ActiveBadge, ItemActions } from "./item-actions";
import { siResolver, toFormValues, type NumberFieldSpec } from "./si-form";
import { SIMPLE_KINDS, type SimpleKind } from "./simple-kinds";
import { WorkshopTable } from "./workshop-table";

export interface SimpleRow {
  id: string;
  name: string;
  active: boolean;
  setupCount: number;
  [field: string]: unknown;
}

interface ItemFormProps {
  kind: SimpleKind;
  id: string | null;
  initial: Record<string, unknown>;
  unitSystem: UnitSystem;
  onDone: () => void;
}

function ItemForm({ kind, id, initial, unitSystem, onDone }: ItemFormProps) {
  const spec = SIMPLE_KINDS[kind];
  const router = useRouter();
  const numbers = useMemo<NumberFieldSpec[]>(
    () => spec.fields.flatMap((f) => (f.type === "number" ? [{ path: f.path, quantity: f.quantity }] : [])),
    [spec],
  );
  const form = useForm<FieldValues>({
    resolver: siResolver(spec.schema, numbers, unitSystem),
    defaultValues: toFormValues(initial, numbers, unitSystem),
  });
  const [message, setMessage] = useState<string | null>(null);
  const save = useMutation({
    mutationFn: (values: FieldValues) => saveCatalogueItemRequest(kind, id, values),
    onSuccess: () => {
      router.refresh();
      onDone();
    },
    onError: (error) =>
      setMessage(
        [
          error.message,
          ...applyServerIssues(
            error instanceof ApiError ? error.error.issues : [],
            (p, e) => form.setError(p, e),
            () => true,
          ),
        ].join(" "),
      ),
  });
  const { register, formState } = form;
  return (
    <form
      onSubmit={form.handleSubmit((v) => save.mutate(v))}
      noValidate
      className="panel grid gap-3 p-4 sm:grid-cols-3"
      data-testid="item-form"
      aria-label={id ? `Edit ${String(initial.name)}` : `New ${spec.one}`}
    >
      <h3 className="font-display font-bold sm:col-span-3">{id ? `Edit ${String(initial.name)}` : `New ${spec.one}`}</h3>
      {spec.fields.map((f) =>
        f.type === "number" ? (
          <NumberField
            key={f.path}
            path={f.path}
            label={f.label}
            quantity={f.quantity}
            unitSystem={unitSystem}
            register={register}
            errors={formState.errors}
            testId={`field-${f.path}`}
          />
        ) : f.type === "select" ? (
          <SelectField
            key={f.path}
            path={f.path}
            label={f.label}
            options={f.options.map((o) => ({ value: o, label: o }))}
            register={register}
            errors={formState.errors}
            testId={`field-${f.path}`}
          />
        ) : (
          <TextField
            key={f.path}
            path={f.path}
            label={f.label}
            multiline={f.multiline}
            register={register}
            errors={formState.errors}
            testId={`field-${f.path}`}
            className={f.multiline ? "sm:col-span-3" : ""}
          />
        ),
      )}
      <div className="flex items-center gap-3 sm:col-span-3">
        <button
          type="submit"
          disabled={save.isPending}
          className="rounded bg-accent px-3 py-1.5 text-sm text-white"
          data-testid="item-save"
        >
          {id ? "Save" : `Add the ${spec.one}`}
        </button>
        <button type="button" onClick={onDone} className="rounded border border-hairline bg-white px-3 py-1.5 text-sm">
          Cancel
        </button>
        {message && (
          <p className="text-sm text-flag-stop" role="alert">
            {message}
          </p>
        )}
      </div>
    </form>
  );
}

interface SimpleCatalogueProps {
  kind: SimpleKind;
  rows: SimpleRow[];
  unitSystem: UnitSystem;
}

const shown = (value: unknown, quantity: Quantity | undefined, unitSystem: UnitSystem) =>
  quantity && typeof value === "number" ? formatQuantity(quantity, value, unitSystem) : String(value ?? "");

/** A page of mounts, adapters or templates with their usage, and one form to add or edit one. */
export function SimpleCatalogue({ kind, rows, unitSystem }: SimpleCatalogueProps) {
  const spec = SIMPLE_KINDS[kind];
  const [editing, setEditing] = useState<{ id: string | null; initial: Record<string, unknown> } | null>(null);
  const cell = "border-t border-hairline px-3 py-2";
  const valuesOf = (row: SimpleRow) => Object.fromEntries(spec.fields.map((f) => [f.path, row[f.path]]));
  return (
    <div className="space-y-3">
      <div className="flex justify-end">
        <button
          type="button"
          onClick={() => setEditing({ id: null, initial: spec.blank })}
          className="rounded bg-accent px-3 py-1.5 text-sm text-white"
          data-testid="new-item"
        >
          New {spec.one}
        </button>
      </div>
      {editing && editing.id === null && (
        <ItemForm kind={kind} id={null} initial={editing.initial} unitSystem={unitSystem} onDone={() => setEditing(null)} />
      )}
      <WorkshopTable testId={`workshop-${kind}`}>
        <thead className="text-left text-muted">
          <tr>
            <th className="px-3 py-2">Name</th>
            {spec.columns.map((c) => (
              <th key={c.path} className="px-3 py-2">
                {c.label}
              </th>
            ))}
            <th className="px-3 py-2">Used by</th>
            <th className="px-3 py-2">State</th>
            <th className="px-3 py-2">
              <span className="sr-only">Actions</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.id} data-testid="item-row" data-item-id={row.id}>
              <td className={cell}>{row.name}</td>
              {spec.columns.map((c) => (
                <td key={c.path} className={`${cell} ${c.quantity ? "figure" : ""}`}>
                  {shown(row[c.path], c.quantity, unitSystem)}
                </td>
              ))}
              <td className={`${cell} figure`}>
                {row.setupCount} setup{row.setupCount === 1 ? "" : "s"}
              </td>
              <td className={cell}>
                <ActiveBadge active={row.active} />
              </td>
              <td className={cell}>
                <span className="inline-flex flex-wrap gap-2">
                  <button
                    type="button"
                    onClick={() => setEditing({ id: row.id, initial: valuesOf(row) })}
                    className="rounded border border-accent bg-white px-2 py-0.5 text-sm text-accent-dark"
                    aria-label={`Edit ${row.name}`}
                    data-testid="item-edit"
                  >
                    Edit
                  </button>
                  <ItemActions kind={kind} id={row.id} name={row.name} active={row.active} setupCount={row.setupCount} />
                </span>
              </td>
            </tr>
          ))}
        </tbody>
      </WorkshopTable>
      {editing && editing.id !== null && (
        <ItemForm
          key={editing.id}
          kind={kind}
          id={editing.id}
          initial={editing.initial}
          unitSystem={unitSystem}
          onDone={() => setEditing(null)}
        />
      )}
    </div>
  );
}
