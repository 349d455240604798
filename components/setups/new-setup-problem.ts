import type { AppError } from "@/lib/errors";

// What the new-setup form says when the server refuses a new setup, with JavaScript (from the JSON
// route's error) or without (from the address the form route sends the browser back to).

export type NewSetupField = "name" | "modelId";
export interface NewSetupProblem {
  /** The field to fix, or null when it is neither. */
  field: NewSetupField | null;
  message: string;
}

export const UNKNOWN_MODEL_MESSAGE = "That envelope model is not in the catalogue: choose one from the list.";
export const GENERIC_NEW_SETUP_MESSAGE = "The setup could not be made. Check the name and the envelope model, then try again.";

/** The field at fault first (the name before the model), else the server's own words. */
export function newSetupProblemOf(error: AppError): NewSetupProblem {
  const issues = error.issues ?? [];
  const name = issues.find((issue) => issue.path === "name");
  if (name) return { field: "name", message: name.message };
  // "draft": the body named neither a draft nor a model, which in this form means no model was chosen.
  if (issues.some((issue) => issue.path === "modelId" || issue.path === "draft"))
    return { field: "modelId", message: UNKNOWN_MODEL_MESSAGE };
  return { field: null, message: error.message };
}
