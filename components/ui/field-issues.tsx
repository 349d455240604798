"use client";
import { createContext, useCallback, useContext, useEffect, useState } from "react";

/** A field that shows an error: its element's id (to focus it), its label (to name it) and the message. */
export interface FieldIssue {
  id: string;
  label: string;
  message: string;
}

export type ReportFieldIssue = (id: string, issue: FieldIssue | null) => void;

// Outside a form that collects them (a lone field), issues are only shown beside the field.
const FieldIssuesContext = createContext<ReportFieldIssue>(() => {});

export const FieldIssuesProvider = FieldIssuesContext.Provider;

/**
 * A field's error message, kept beside the field and reported to the surrounding form so that it can
 * refuse to save while the field shows it. The report is made at once when the message is set (a
 * click on Save right after leaving the field already sees it) and withdrawn when the field goes.
 */
export function useFieldError(id: string, label: string) {
  const report = useContext(FieldIssuesContext);
  const [error, setErrorState] = useState<string | null>(null);
  const setError = useCallback(
    (message: string | null) => {
      setErrorState(message);
      report(id, message ? { id, label, message } : null);
    },
    [id, label, report],
  );
  // Also follows changes made during render (a new value from outside clears the message).
  useEffect(() => {
    report(id, error ? { id, label, message: error } : null);
  }, [id, label, error, report]);
  useEffect(() => () => report(id, null), [id, report]);
  /** For a reset during render (a new value from outside): the effect above withdraws the report. */
  const clearDuringRender = () => setErrorState(null);
  return { error, setError, clearDuringRender };
}

/** The issues in the order their fields stand on the page, so the first named is the first met. */
export function inPageOrder(issues: readonly FieldIssue[]): FieldIssue[] {
  const at = (issue: FieldIssue) => (typeof document === "undefined" ? null : document.getElementById(issue.id));
  return [...issues].sort((a, b) => {
    const [ea, eb] = [at(a), at(b)];
    if (!ea || !eb) return 0;
    return ea.compareDocumentPosition(eb) & Node.DOCUMENT_POSITION_FOLLOWING ? -1 : 1;
  });
}

/** Moves focus to a field, opening the collapsed section it sits in first. */
export function focusField(id: string): void {
  const element = document.getElementById(id);
  if (!element) return;
  for (let details = element.closest("details"); details; details = details.parentElement?.closest("details") ?? null) {
    details.open = true;
  }
  element.focus();
  element.scrollIntoView({ block: "center" });
}
