import type { SetupStatus, UnitSystem } from "@/lib/domain";
import type { AppError } from "@/lib/errors";
import type { SetupDraft } from "@/lib/setups/setup-draft";

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly error: AppError,
  ) {
    super(error.message);
  }
}

async function call<T>(method: string, url: string, body: unknown): Promise<T> {
  const response = await fetch(url, { method, headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
  const data = (await response.json().catch(() => ({}))) as T & { error?: AppError };
  if (!response.ok) throw new ApiError(response.status, data.error ?? { code: "internal", message: `The server answered ${response.status}.` });
  return data;
}

export const saveSetupRequest = (id: string, version: number, draft: SetupDraft) =>
  call<{ version: number; status: SetupStatus }>("PUT", `/api/setups/${encodeURIComponent(id)}`, { version, draft });

export const submitSetupRequest = (id: string, version: number, acknowledgeCautions: boolean) =>
  call<{ version: number; status: SetupStatus }>("POST", `/api/setups/${encodeURIComponent(id)}/submit`, { version, acknowledgeCautions });

export const savePreferencesRequest = (unitSystem: UnitSystem) => call<{ unitSystem: UnitSystem }>("PUT", "/api/me/preferences", { unitSystem });
