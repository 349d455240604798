"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useId } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { ATTACHMENTS, PAYLOAD_CATEGORIES, PAYLOAD_SHAPES, type UnitSystem } from "@/lib/domain";
import { setupPayloadDraftSchema, type SetupPayloadDraft } from "@/lib/setups/setup-draft";
import { parseNumber } from "@/lib/parse-number";
import { fromDisplay, toDisplay, unitOf } from "@/lib/units";
import type { PlannerAdapter } from "./types";

// The form holds figures in the person's units; they become SI (and pass the setup schema) on submit.
/** A typed figure read the one way every number field reads it (a decimal point or comma, never a guess). */
const figure = () =>
  z.string().transform((text, context) => {
    const parsed = parseNumber(text);
    if (parsed.ok) return parsed.value;
    context.addIssue({ code: "custom", message: parsed.message });
    return z.NEVER;
  });
const positive = () => figure().pipe(z.number().positive("Must be more than 0."));

const displaySchema = z.object({
  name: z.string().trim().min(1, "Give it a name.").max(120, "At most 120 characters."),
  category: z.enum(PAYLOAD_CATEGORIES),
  shape: z.enum(PAYLOAD_SHAPES),
  mass: positive(),
  length: positive(),
  width: positive(),
  height: positive(),
  attachment: z.enum(ATTACHMENTS),
  adapterId: z.string(),
  offsetX: figure(),
  offsetZ: figure(),
  dragArea: figure().pipe(z.number().min(0, "Cannot be negative.")),
});
type DisplayValues = z.input<typeof displaySchema>;

function toForm(p: SetupPayloadDraft, units: UnitSystem): DisplayValues {
  const f = (q: Parameters<typeof toDisplay>[0], v: number) => String(Number(toDisplay(q, v, units).toFixed(3)));
  return {
    name: p.name,
    category: p.category,
    shape: p.shape,
    mass: f("itemMass", p.massKg),
    length: f("smallLength", p.lengthM),
    width: f("smallLength", p.widthM),
    height: f("smallLength", p.heightM),
    attachment: p.attachment,
    adapterId: p.adapterId ?? "",
    offsetX: f("smallLength", p.offsetXM),
    offsetZ: f("smallLength", p.offsetZM),
    dragArea: f("area", p.dragAreaM2),
  };
}

interface PayloadFormProps {
  initial: SetupPayloadDraft;
  units: UnitSystem;
  adapters: PlannerAdapter[];
  submitLabel: string;
  onSubmit: (payload: SetupPayloadDraft) => void;
  onCancel: () => void;
}

export function PayloadForm({ initial, units, adapters, submitLabel, onSubmit, onCancel }: PayloadFormProps) {
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<DisplayValues, unknown, z.output<typeof displaySchema>>({
    resolver: zodResolver(displaySchema),
    defaultValues: toForm(initial, units),
  });

  const submit = handleSubmit((v) => {
    const candidate: SetupPayloadDraft = {
      templateId: initial.templateId,
      name: v.name,
      category: v.category,
      shape: v.shape,
      massKg: fromDisplay("itemMass", v.mass, units),
      lengthM: fromDisplay("smallLength", v.length, units),
      widthM: fromDisplay("smallLength", v.width, units),
      heightM: fromDisplay("smallLength", v.height, units),
      attachment: v.attachment,
      adapterId: v.adapterId || null,
      offsetXM: fromDisplay("smallLength", v.offsetX, units),
      offsetZM: fromDisplay("smallLength", v.offsetZ, units),
      dragAreaM2: fromDisplay("area", v.dragArea, units),
    };
    const checked = setupPayloadDraftSchema.safeParse(candidate);
    if (!checked.success) {
      // Map the SI field names back onto the form's fields so the message lands beside the input.
      const field: Record<string, keyof DisplayValues> = {
        massKg: "mass",
        lengthM: "length",
        widthM: "width",
        heightM: "height",
        offsetXM: "offsetX",
        offsetZM: "offsetZ",
        dragAreaM2: "dragArea",
        name: "name",
      };
      for (const issue of checked.error.issues) {
        const name = field[String(issue.path[0])] ?? "name";
        setError(name, { message: issue.message });
      }
      return;
    }
    onSubmit(checked.data);
  });

  const formId = useId();
  const input = "mt-0.5 w-full rounded border border-hairline bg-white px-2 py-1";
  const err = (key: keyof DisplayValues) =>
    errors[key] ? (
      <span id={`${formId}-${key}-error`} className="text-xs text-flag-stop" role="alert">
        {errors[key]?.message}
      </span>
    ) : null;
  // Ties a field to its message, so a screen reader reads the error with the field.
  const describe = (key: keyof DisplayValues) =>
    errors[key] ? { "aria-invalid": true, "aria-describedby": `${formId}-${key}-error` } : {};
  const small = unitOf("smallLength", units);
  return (
    <form
      onSubmit={submit}
      noValidate
      className="mt-3 grid grid-cols-2 gap-3 rounded border border-hairline bg-paper p-3 sm:grid-cols-4"
      data-testid="payload-form"
    >
      <label className="col-span-2 block text-sm text-muted">
        Name
        <input {...register("name")} {...describe("name")} className={input} />
        {err("name")}
      </label>
      <label className="block text-sm text-muted">
        Category
        <select {...register("category")} className={input}>
          {PAYLOAD_CATEGORIES.map((c) => (
            <option key={c}>{c}</option>
          ))}
        </select>
      </label>
      <label className="block text-sm text-muted">
        Shape
        <select {...register("shape")} className={input}>
          {PAYLOAD_SHAPES.map((c) => (
            <option key={c}>{c}</option>
          ))}
        </select>
      </label>
      <label className="block text-sm text-muted">
        Mass ({unitOf("itemMass", units)})
        <input {...register("mass")} {...describe("mass")} inputMode="decimal" className={input} data-testid="payload-mass" />
        {err("mass")}
      </label>
      <label className="block text-sm text-muted">
        Length ({small})<input {...register("length")} {...describe("length")} inputMode="decimal" className={input} />
        {err("length")}
      </label>
      <label className="block text-sm text-muted">
        Width ({small})<input {...register("width")} {...describe("width")} inputMode="decimal" className={input} />
        {err("width")}
      </label>
      <label className="block text-sm text-muted">
        Height ({small})<input {...register("height")} {...describe("height")} inputMode="decimal" className={input} />
        {err("height")}
      </label>
      <label className="block text-sm text-muted">
        Attachment
        <select {...register("attachment")} className={input}>
          {ATTACHMENTS.map((c) => (
            <option key={c}>{c}</option>
          ))}
        </select>
      </label>
      <label className="block text-sm text-muted">
        Adapter
        <select {...register("adapterId")} className={input}>
          <option value="">none</option>
          {adapters.map((a) => (
            <option key={a.id} value={a.id}>
              {a.name}
            </option>
          ))}
        </select>
      </label>
      <label className="block text-sm text-muted">
        Offset fore/aft ({small}, aft +)
        <input {...register("offsetX")} {...describe("offsetX")} inputMode="decimal" className={input} />
        {err("offsetX")}
      </label>
      <label className="block text-sm text-muted">
        Offset up/down ({small}, below −)
        <input {...register("offsetZ")} {...describe("offsetZ")} inputMode="decimal" className={input} />
        {err("offsetZ")}
      </label>
      <label className="block text-sm text-muted">
        Drag area ({unitOf("area", units)})
        <input {...register("dragArea")} {...describe("dragArea")} inputMode="decimal" className={input} />
        {err("dragArea")}
      </label>
      <div className="col-span-2 flex items-end gap-2 sm:col-span-3">
        <button type="submit" className="rounded bg-accent px-3 py-1.5 text-sm text-white">
          {submitLabel}
        </button>
        <button type="button" className="rounded border border-hairline px-3 py-1.5 text-sm" onClick={onCancel}>
          Cancel
        </button>
      </div>
    </form>
  );
}
