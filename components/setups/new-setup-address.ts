import type { AppError } from "@/lib/errors";
import { setupDraftSchema } from "@/lib/setups/setup-draft";
import { GENERIC_NEW_SETUP_MESSAGE, UNKNOWN_MODEL_MESSAGE, newSetupProblemOf, type NewSetupProblem } from "./new-setup-problem";

// The no-JavaScript form's way back: the form route sends the browser to the list with which field
// failed and what was typed, and the page words the problem itself. The message is never read from
// the address, so a link cannot make the page say whatever it likes.

/** Enough of the typed name to show it again and to see that it was too long. */
const ECHOED_NAME_CHARS = 200;

/** Where a refused form post sends the browser: sign-in for a stranger, else the list with the fields as typed. */
export function newSetupFailurePath(error: AppError, fields: Record<string, string>): string {
  if (error.code === "unauthenticated") return `/sign-in?next=${encodeURIComponent("/setups")}`;
  const query = new URLSearchParams({
    problem: newSetupProblemOf(error).field ?? "other",
    name: (fields.name ?? "").slice(0, ECHOED_NAME_CHARS),
    modelId: fields.modelId ?? "",
  });
  return `/setups?${query}`;
}

const first = (value: string | string[] | undefined) => (Array.isArray(value) ? value[0] : value);

/** The problem the list shows on its form, from the address the form route sent the browser to. */
export function newSetupProblemFrom(searchParams: Record<string, string | string[] | undefined>): NewSetupProblem | null {
  const problem = first(searchParams.problem);
  if (!problem) return null;
  if (problem === "name") {
    const checked = setupDraftSchema.shape.name.safeParse(first(searchParams.name) ?? "");
    if (!checked.success) return { field: "name", message: checked.error.issues[0]?.message ?? GENERIC_NEW_SETUP_MESSAGE };
  }
  if (problem === "modelId") return { field: "modelId", message: UNKNOWN_MODEL_MESSAGE };
  return { field: null, message: GENERIC_NEW_SETUP_MESSAGE };
}
