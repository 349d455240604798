import type { z } from "zod";
import { adapterValuesSchema, mountValuesSchema, payloadTemplateValuesSchema } from "@/lib/catalogue/schemas";
import { ATTACHMENTS, PAYLOAD_CATEGORIES, PAYLOAD_SHAPES, THREADS } from "@/lib/domain";
import type { Quantity } from "@/lib/units";

// The three small kinds of catalogue item as the Workshop edits them: their schema (shared with the
// routes), their fields in order, and which figures the table shows.

export type SimpleKind = "mounts" | "adapters" | "templates";

export type SimpleField =
  | { path: string; label: string; type: "text"; multiline?: boolean }
  | { path: string; label: string; type: "select"; options: readonly string[] }
  | { path: string; label: string; type: "number"; quantity: Quantity };

export interface SimpleKindSpec {
  schema: z.ZodType<Record<string, unknown>, Record<string, unknown>>;
  one: string;
  fields: readonly SimpleField[];
  /** Figures in the table, after the name. */
  columns: readonly { path: string; label: string; quantity?: Quantity }[];
  blank: Record<string, unknown>;
}

const text = (path: string, label: string, multiline = false): SimpleField => ({ path, label, type: "text", multiline });
const select = (path: string, label: string, options: readonly string[]): SimpleField => ({ path, label, type: "select", options });
const number = (path: string, label: string, quantity: Quantity): SimpleField => ({ path, label, type: "number", quantity });

export const SIMPLE_KINDS: Record<SimpleKind, SimpleKindSpec> = {
  mounts: {
    schema: mountValuesSchema as unknown as SimpleKindSpec["schema"],
    one: "mount",
    fields: [
      text("name", "Name"),
      select("thread", "Screw thread", THREADS),
      number("massKg", "Mass", "itemMass"),
      number("ratedLoadKg", "Rated load", "mass"),
      number("safetyLineBreakingLoadN", "Safety-line breaking load", "force"),
    ],
    columns: [
      { path: "thread", label: "Thread" },
      { path: "massKg", label: "Mass", quantity: "itemMass" },
      { path: "ratedLoadKg", label: "Rated load", quantity: "mass" },
      { path: "safetyLineBreakingLoadN", label: "Safety line", quantity: "force" },
    ],
    blank: { name: "", thread: THREADS[0], massKg: 0.05, ratedLoadKg: 1, safetyLineBreakingLoadN: 400 },
  },
  adapters: {
    schema: adapterValuesSchema as unknown as SimpleKindSpec["schema"],
    one: "adapter",
    fields: [
      text("name", "Name"),
      select("fromThread", "Thread in (the payload's side)", ATTACHMENTS),
      select("toThread", "Thread out (the mount's screw)", THREADS),
      number("massKg", "Mass", "itemMass"),
      number("ratedLoadKg", "Rated load", "mass"),
    ],
    columns: [
      { path: "fromThread", label: "In" },
      { path: "toThread", label: "Out" },
      { path: "massKg", label: "Mass", quantity: "itemMass" },
      { path: "ratedLoadKg", label: "Rated load", quantity: "mass" },
    ],
    blank: { name: "", fromThread: ATTACHMENTS[1], toThread: THREADS[0], massKg: 0.01, ratedLoadKg: 1 },
  },
  templates: {
    schema: payloadTemplateValuesSchema as unknown as SimpleKindSpec["schema"],
    one: "payload template",
    fields: [
      text("name", "Name"),
      select("category", "Category", PAYLOAD_CATEGORIES),
      text("description", "Description", true),
      number("massKg", "Mass", "itemMass"),
      select("shape", "Drawn as", PAYLOAD_SHAPES),
      number("lengthM", "Length", "smallLength"),
      number("widthM", "Width", "smallLength"),
      number("heightM", "Height", "smallLength"),
      select("attachment", "Attachment", ATTACHMENTS),
      number("dragAreaM2", "Drag area", "area"),
      number("offsetXM", "Offset fore/aft (aft +)", "smallLength"),
      number("offsetZM", "Offset up/down (below −)", "smallLength"),
    ],
    columns: [
      { path: "category", label: "Category" },
      { path: "massKg", label: "Mass", quantity: "itemMass" },
      { path: "attachment", label: "Attachment" },
      { path: "dragAreaM2", label: "Drag area", quantity: "area" },
    ],
    blank: {
      name: "",
      description: "",
      category: "other",
      massKg: 0.1,
      shape: "box",
      lengthM: 0.08,
      widthM: 0.06,
      heightM: 0.05,
      attachment: THREADS[0],
      dragAreaM2: 0.003,
      offsetXM: 0,
      offsetZM: -0.075,
    },
  },
};
