import type { BalanceResult } from "@/lib/balance";
import type {
  AttachmentView,
  DecisionOutcome,
  FlagCode,
  FlagLevel,
  PayloadCategory,
  ReviewReasonCode,
  Role,
  SetupStatus,
  UnitSystem,
} from "@/lib/domain";
import type { AppError } from "@/lib/errors";
import type { SetupDraft } from "@/lib/setups/setup-draft";
import { postWithUploadProgress, type UploadProgress } from "./upload-with-progress";

// The UI's one way to change anything: the same JSON route handlers that scripts use, called from
// TanStack Query mutations. A failure arrives as an ApiError with the server's typed error.

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly error: AppError,
  ) {
    super(error.message);
  }
}

async function call<T>(method: string, url: string, body?: unknown): Promise<T> {
  const response = await fetch(url, {
    method,
    headers: body === undefined ? {} : { "content-type": "application/json" },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (response.status === 204) return null as T;
  const data = (await response.json().catch(() => ({}))) as T & { error?: AppError };
  if (!response.ok)
    throw new ApiError(response.status, data.error ?? { code: "internal", message: `The server answered ${response.status}.` });
  return data;
}

const setupUrl = (id: string, rest = "") => `/api/setups/${encodeURIComponent(id)}${rest}`;

export const createSetupRequest = (input: { modelId: string; name?: string } | { draft: SetupDraft }) =>
  call<{ id: string; version: number; result: BalanceResult }>("POST", "/api/setups", input);

export const duplicateSetupRequest = (id: string) => call<{ id: string }>("POST", setupUrl(id, "/duplicate"));

export const deleteSetupRequest = (id: string) => call<null>("DELETE", setupUrl(id));

export const saveSetupRequest = (id: string, version: number, draft: SetupDraft) =>
  call<{ version: number; status: SetupStatus }>("PUT", setupUrl(id), { version, draft });

export const submitSetupRequest = (id: string, version: number, acknowledgeCautions: boolean) =>
  call<{ version: number; status: SetupStatus }>("POST", setupUrl(id, "/submit"), { version, acknowledgeCautions });

export const savePreferencesRequest = (unitSystem: UnitSystem) =>
  call<{ unitSystem: UnitSystem }>("PUT", "/api/me/preferences", { unitSystem });

export const changeRoleRequest = (userId: string, role: Role) =>
  call<{ id: string; role: Role }>("PUT", `/api/users/${encodeURIComponent(userId)}/role`, { role });

// ---------------------------------------------------------------- the review desk

export interface QueueRowView {
  id: string;
  name: string;
  ownerName: string;
  modelId: string;
  modelName: string;
  status: SetupStatus;
  payloadMassKg: number;
  freeLiftRatio: number | null;
  worstFlag: FlagLevel | null;
  submittedAt: string | null;
}

export const fetchReviewQueue = (query: string) =>
  call<{ rows: QueueRowView[]; total: number; page: number; pageSize: number }>("GET", `/api/review/queue?${query}`);

export interface ThreadItemView {
  kind: "comment" | "decision";
  id: string;
  at: string;
  authorId: string;
  authorName: string;
  authorRole: Role;
  body: string;
  decision: DecisionOutcome | null;
  setupVersion: number | null;
}

export const fetchThread = (id: string) => call<{ items: ThreadItemView[] }>("GET", setupUrl(id, "/comments"));

export const addCommentRequest = (id: string, body: string) => call<{ id: string }>("POST", setupUrl(id, "/comments"), { body });

export const markThreadReadRequest = (id: string) => call<null>("PUT", setupUrl(id, "/read"));

export const decideRequest = (
  id: string,
  input: { decision: DecisionOutcome; reason: string; reasonCodes: ReviewReasonCode[]; version: number },
) => call<{ id: string; status: SetupStatus; version: number }>("POST", setupUrl(id, "/decision"), input);

// ---------------------------------------------------------------- insight

export interface InsightData {
  payloadMassHistogram: { binStartKg: number; binEndKg: number; category: PayloadCategory; count: number }[];
  setupPayloadMassHistogram: { binStartKg: number; binEndKg: number; count: number }[];
  templateUsage: { templateId: string; name: string; count: number }[];
  railPosition: { modelId: string; binStartM: number; binEndM: number; count: number }[];
  freeLiftRatio: { binStart: number; binEnd: number; count: number }[];
  flagCounts: { code: FlagCode; level: FlagLevel; count: number }[];
  setupsPerMonth: { month: string; status: SetupStatus; count: number }[];
  sendBackReasons: { code: string; count: number }[];
}

export const fetchInsight = (query: string) => call<InsightData>("GET", `/api/insight${query ? `?${query}` : ""}`);
// ---------------------------------------------------------------- attachments

export const fetchAttachments = (setupId: string) => call<{ attachments: AttachmentView[] }>("GET", setupUrl(setupId, "/attachments"));

export const deleteAttachmentRequest = (id: string) => call<null>("DELETE", `/api/attachments/${encodeURIComponent(id)}`);

/** One file as multipart/form-data, with upload progress; a refusal arrives as an ApiError like any other. */
export async function uploadAttachmentRequest(
  setupId: string,
  file: File,
  options: { onProgress?: (progress: UploadProgress) => void; signal?: AbortSignal } = {},
): Promise<AttachmentView> {
  const form = new FormData();
  form.append("file", file, file.name);
  const answer = await postWithUploadProgress(setupUrl(setupId, "/attachments"), form, options);
  let data: { error?: AppError } & Partial<AttachmentView> = {};
  try {
    data = JSON.parse(answer.text) as typeof data;
  } catch {
    // not JSON (e.g. a proxy's error page): the status speaks
  }
  if (answer.status < 200 || answer.status >= 300)
    throw new ApiError(answer.status, data.error ?? { code: "internal", message: `The server answered ${answer.status}.` });
  return data as AttachmentView;
}
// ---------------------------------------------------------------- the Workshop (maker)

export type CatalogueKindPath = "models" | "units" | "mounts" | "adapters" | "templates";
const catalogueUrl = (kind: CatalogueKindPath, id?: string, rest = "") =>
  `/api/catalogue/${kind}${id ? `/${encodeURIComponent(id)}` : ""}${rest}`;

/** Adds (id null) or replaces a catalogue item; the body is the kind's values in SI (lib/catalogue/schemas.ts). */
export const saveCatalogueItemRequest = (kind: CatalogueKindPath, id: string | null, values: unknown) =>
  id === null ? call<{ id: string }>("POST", catalogueUrl(kind), values) : call<{ id: string }>("PUT", catalogueUrl(kind, id), values);

export const setCatalogueActiveRequest = (kind: CatalogueKindPath, id: string, active: boolean) =>
  call<{ id: string; active: boolean }>("PUT", catalogueUrl(kind, id, "/active"), { active });

export const deleteCatalogueItemRequest = (kind: CatalogueKindPath, id: string) => call<null>("DELETE", catalogueUrl(kind, id));

export const addLiftTestRequest = (unitId: string, values: unknown) =>
  call<{ id: string; calibrationFactor: number | null }>("POST", catalogueUrl("units", unitId, "/lift-tests"), values);

export const deleteLiftTestRequest = (unitId: string, testId: string) =>
  call<null>("DELETE", catalogueUrl("units", unitId, `/lift-tests/${encodeURIComponent(testId)}`));

export const importTemplatesRequest = (csv: string) =>
  call<{ created: number; updated: number }>("POST", "/api/catalogue/templates/import", { csv });

/** The preview GLB of hull parameters not yet saved (maker only). */
export const hullPreviewUrl = (hull: unknown) => `/api/catalogue/hull-preview.glb?hull=${encodeURIComponent(JSON.stringify(hull))}`;
