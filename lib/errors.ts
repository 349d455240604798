import type { z } from "zod";

// One error type for routes and actions: a stable code, the HTTP status it maps to, a message a
// person can act on, and (for bad input) the fields at fault. Database errors never reach it raw.
export const ERROR_STATUS = {
  bad_request: 400,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  payload_too_large: 413,
  unsupported_media_type: 415,
  unprocessable: 422,
  too_many_requests: 429,
  internal: 500,
  unavailable: 503,
} as const;

export type ErrorCode = keyof typeof ERROR_STATUS;

export interface FieldIssue {
  path: string;
  message: string;
}

export interface AppError {
  code: ErrorCode;
  message: string;
  issues?: FieldIssue[];
  /** Set on `internal` errors: the id under which the server logged what went wrong. */
  requestId?: string;
  /** Machine-readable facts about the failure (e.g. the database's state on a 503). */
  detail?: Record<string, unknown>;
}

export type Result<T> = { ok: true; data: T } | { ok: false; error: AppError };

export const ok = <T>(data: T): Result<T> => ({ ok: true, data });
export const fail = (code: ErrorCode, message: string, issues?: FieldIssue[]): { ok: false; error: AppError } => ({
  ok: false,
  error: issues ? { code, message, issues } : { code, message },
});

/** Flattens zod issues into "a.b[0].c: message" pairs a form or an API client can point at. */
export function issuesFromZod(error: z.ZodError): FieldIssue[] {
  return error.issues.map((issue) => ({
    path: issue.path.map((part, i) => (typeof part === "number" ? `[${part}]` : `${i === 0 ? "" : "."}${String(part)}`)).join(""),
    message: issue.message,
  }));
}

export function errorResponse(error: AppError): Response {
  return Response.json({ error }, { status: ERROR_STATUS[error.code] });
}
