"use client";
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useEffect, useMemo, useState } from "react";
import { useForm, useWatch, type FieldValues } from "react-hook-form";
import { LifterCanvas } from "@/components/scene";
import { hullParamsSchema, integrateHullProfile, type HullParams } from "@/lib/balance";
import { envelopeModelValuesSchema, type EnvelopeModelValues } from "@/lib/catalogue/schemas";
import { ApiError, hullPreviewUrl, saveCatalogueItemRequest } from "@/lib/client/api";
import type { UnitSystem } from "@/lib/domain";
import { formatQuantity, toDisplay } from "@/lib/units";
import { applyServerIssues, NumberField, TextField } from "./form-fields";
import {
  AERO_FIELDS,
  HULL_FIELDS,
  LIMIT_FIELDS,
  MASS_RIGGING_FIELDS,
  MODEL_NUMBER_FIELDS,
  suggestedRigging,
  type LabelledField,
} from "./model-fields";
import { siResolver, toFormValues, toSiValues } from "./si-form";

interface ModelEditorProps {
  id: string | null;
  initial: EnvelopeModelValues;
  unitSystem: UnitSystem;
  setupCount: number;
}

/** The hull's parameters from the form as typed, when they make a hull (else null: keep the last preview). */
function hullOf(form: FieldValues, unitSystem: UnitSystem): HullParams | null {
  const si = toSiValues(form, HULL_FIELDS, unitSystem) as { hull?: unknown };
  const parsed = hullParamsSchema.safeParse(si.hull);
  return parsed.success ? parsed.data : null;
}

/** Waits until the maker stops typing before asking for a new preview GLB. */
function useSettled<T>(value: T, delayMs: number): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), delayMs);
    return () => clearTimeout(timer);
  }, [value, delayMs]);
  return settled;
}

function Fieldset({
  legend,
  fields,
  unitSystem,
  form,
}: {
  legend: string;
  fields: readonly LabelledField[];
  unitSystem: UnitSystem;
  form: ReturnType<typeof useForm<FieldValues>>;
}) {
  return (
    <fieldset className="panel p-4">
      <legend className="px-1 font-display font-bold">{legend}</legend>
      <div className="grid gap-3 sm:grid-cols-2 xl:grid-cols-3">
        {fields.map((f) => (
          <NumberField key={f.path} {...f} unitSystem={unitSystem} register={form.register} errors={form.formState.errors} />
        ))}
      </div>
    </fieldset>
  );
}

/**
 * An envelope model: the hull with a live 3D preview and what the engine computes from it (gas
 * volume, centre of buoyancy, surface area), then mass, rigging, sail and the flag limits.
 */
export function ModelEditor({ id, initial, unitSystem, setupCount }: ModelEditorProps) {
  const router = useRouter();
  const form = useForm<FieldValues>({
    resolver: siResolver(envelopeModelValuesSchema, MODEL_NUMBER_FIELDS, unitSystem),
    defaultValues: toFormValues(initial, MODEL_NUMBER_FIELDS, unitSystem),
    mode: "onBlur",
  });
  const watched = useWatch({ control: form.control });
  const liveHull = useMemo(() => hullOf(watched, unitSystem), [watched, unitSystem]);
  // While a field is half-typed the preview keeps the last hull that parsed (updated during render).
  const [lastGoodHull, setLastGoodHull] = useState<HullParams>(initial.hull);
  if (liveHull && liveHull !== lastGoodHull) setLastGoodHull(liveHull);
  const hull = liveHull ?? lastGoodHull;
  const previewHull = useSettled(hull, 400);
  const integrals = useMemo(() => integrateHullProfile(hull), [hull]);
  const rigging = toSiValues(watched, MASS_RIGGING_FIELDS, unitSystem) as Partial<EnvelopeModelValues>;
  const finite = (v: unknown, fallback: number) => (typeof v === "number" && Number.isFinite(v) ? v : fallback);
  const [formMessage, setFormMessage] = useState<string | null>(null);

  const save = useMutation({
    mutationFn: (values: EnvelopeModelValues) => saveCatalogueItemRequest("models", id, values),
    onSuccess: ({ id: savedId }) => {
      setFormMessage("Saved. Setups on this model use the change from now on.");
      if (id === null) router.push(`/workshop/models/${savedId}`);
      else router.refresh();
    },
    onError: (error) => {
      const issues = error instanceof ApiError ? error.error.issues : undefined;
      const rest = applyServerIssues(
        issues,
        (path, e) => form.setError(path, e),
        (path) => path in (form.getValues() as object) || path.includes("."),
      );
      setFormMessage([error.message, ...rest].join(" "));
    },
  });
  const submit = form.handleSubmit(
    (values) => save.mutate(values as EnvelopeModelValues),
    () => setFormMessage("Some fields need a look: see the messages beside them."),
  );

  const suggest = () => {
    const next = suggestedRigging(hull);
    const shown = toFormValues(
      { ...toSiValues(form.getValues(), MODEL_NUMBER_FIELDS, unitSystem), ...next },
      MODEL_NUMBER_FIELDS,
      unitSystem,
    );
    for (const f of [...MASS_RIGGING_FIELDS.filter((x) => !["nominalMassKg", "railTabCount"].includes(x.path)), ...AERO_FIELDS]) {
      form.setValue(
        f.path,
        f.path.split(".").reduce<unknown>((n, k) => (n as Record<string, unknown>)[k], shown),
        { shouldDirty: true },
      );
    }
  };

  const railStart = finite(rigging.railStartXM, initial.railStartXM);
  const railEnd = finite(rigging.railEndXM, initial.railEndXM);
  const tether = { x: finite(rigging.tetherPointXM, initial.tetherPointXM), z: finite(rigging.tetherPointZM, initial.tetherPointZM) };
  const summary = `Preview of the hull: ${formatQuantity("length", hull.lengthM, unitSystem)} long, ${formatQuantity("length", hull.maxDiameterM, unitSystem)} across, ${formatQuantity("volume", integrals.gasVolumeM3, unitSystem)} of gas.`;

  return (
    <form onSubmit={submit} noValidate className="space-y-4" data-testid="model-editor">
      {setupCount > 0 && (
        <p className="panel px-4 py-2 text-sm" data-testid="model-used-by">
          {setupCount} setup{setupCount === 1 ? "" : "s"} use this model: what you save here changes their balance when they are next opened
          or saved.
        </p>
      )}
      <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_20rem]">
        <LifterCanvas
          className="h-[22rem] w-full"
          glbUrl={hullPreviewUrl(previewHull)}
          hullLengthM={hull.lengthM}
          hullMaxDiameterM={hull.maxDiameterM}
          rail={{ startX: railStart, endX: Math.max(railStart, railEnd), z: finite(rigging.railZM, initial.railZM) }}
          railTabCount={Math.max(2, Math.round(finite(rigging.railTabCount, initial.railTabCount)))}
          mountX={(railStart + railEnd) / 2}
          payloads={[]}
          buoyancyCentre={integrals.buoyancyCentre}
          centreOfMass={{ x: finite(rigging.massCentreXM, initial.massCentreXM), z: finite(rigging.massCentreZM, initial.massCentreZM) }}
          tetherPoint={tether}
          trimDeg={0}
          tetherAngleDeg={0}
          windMS={0}
          summary={summary}
        />
        <div className="panel space-y-2 p-4 text-sm" data-testid="model-computed" aria-live="polite">
          <h2 className="text-base">From the hull</h2>
          <p>
            Gas volume{" "}
            <span className="figure font-bold" data-testid="preview-volume" data-volume-m3={integrals.gasVolumeM3}>
              {formatQuantity("volume", integrals.gasVolumeM3, unitSystem)}
            </span>
          </p>
          <p>
            Centre of buoyancy{" "}
            <span className="figure" data-testid="preview-buoyancy">
              {formatQuantity("length", integrals.buoyancyCentre.x, unitSystem, 3)}
            </span>{" "}
            from the nose
          </p>
          <p>
            Surface area (hull and both faces of the fins){" "}
            <span className="figure" data-testid="preview-area">
              {formatQuantity("surfaceArea", integrals.surfaceAreaM2, unitSystem)}
            </span>
          </p>
          {integrals.fabricMassKg !== null && (
            <p>
              Fabric alone <span className="figure">{formatQuantity("mass", integrals.fabricMassKg, unitSystem)}</span> (weigh the sewn
              envelope for its mass)
            </p>
          )}
          <p className="text-muted">The preview is drawn from these parameters; the scene updates when you pause typing.</p>
          <button
            type="button"
            onClick={suggest}
            className="rounded border border-hairline bg-white px-3 py-1.5"
            data-testid="suggest-rigging"
          >
            Suggest rigging and sail from the hull
          </button>
        </div>
      </div>

      <fieldset className="panel grid gap-3 p-4 sm:grid-cols-2">
        <legend className="px-1 font-display font-bold">The model</legend>
        <TextField path="name" label="Name" register={form.register} errors={form.formState.errors} testId="model-name" />
        <TextField path="slug" label="Short name (for files and addresses)" register={form.register} errors={form.formState.errors} />
        <TextField
          path="description"
          label="Description"
          register={form.register}
          errors={form.formState.errors}
          multiline
          className="sm:col-span-2"
        />
      </fieldset>
      <Fieldset legend="Hull" fields={HULL_FIELDS} unitSystem={unitSystem} form={form} />
      <Fieldset legend="Mass, tether point and rail" fields={MASS_RIGGING_FIELDS} unitSystem={unitSystem} form={form} />
      <Fieldset legend="Sail (aerodynamic coefficients)" fields={AERO_FIELDS} unitSystem={unitSystem} form={form} />
      <fieldset className="panel p-4">
        <legend className="px-1 font-display font-bold">Flag limits</legend>
        <p className="mb-3 text-sm text-muted">Leave a limit empty to use the default shown, marked with where it comes from.</p>
        <div className="grid gap-3 sm:grid-cols-2 xl:grid-cols-3">
          {LIMIT_FIELDS.map((f) => {
            const shown = f.quantity
              ? formatQuantity(f.quantity, f.defaultSI, unitSystem)
              : `${f.defaultSI}${f.plainUnit ? ` ${f.plainUnit}` : ""}`;
            return (
              <NumberField
                key={f.path}
                {...f}
                unitSystem={unitSystem}
                register={form.register}
                errors={form.formState.errors}
                placeholder={String(Number((f.quantity ? toDisplay(f.quantity, f.defaultSI, unitSystem) : f.defaultSI).toFixed(3)))}
                hint={`Default ${shown} (${f.source})`}
              />
            );
          })}
        </div>
      </fieldset>
      <div className="flex flex-wrap items-center gap-3">
        <button type="submit" disabled={save.isPending} className="rounded bg-accent px-4 py-2 text-white" data-testid="model-save">
          {id === null ? "Add the model" : "Save the model"}
        </button>
        {formMessage && (
          <p className="text-sm" role="status" data-testid="model-save-message">
            {formMessage}
          </p>
        )}
      </div>
    </form>
  );
}
