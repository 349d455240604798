import { FLAG_LEVELS, QUEUE_SORTS, SETUP_STATUSES, type FlagLevel, type QueueSort, type SetupStatus } from "@/lib/domain";

// The queue's state lives in the URL (so a reload, a link or the back button shows the same page);
// this reads and writes it. Values the server would refuse fall back to the defaults here.

export interface QueueParams {
  status: SetupStatus | "any";
  worst: FlagLevel | "";
  model: string;
  q: string;
  sort: QueueSort;
  dir: "asc" | "desc";
  page: number;
  pageSize: number;
}

export const QUEUE_DEFAULTS: QueueParams = {
  status: "submitted",
  worst: "",
  model: "",
  q: "",
  sort: "waiting",
  dir: "desc",
  page: 1,
  pageSize: 25,
};
export const PAGE_SIZES = [10, 25, 50, 100] as const;

const oneOf = <T extends string>(value: string | null, allowed: readonly T[], fallback: T): T =>
  value !== null && (allowed as readonly string[]).includes(value) ? (value as T) : fallback;

export function readQueueParams(search: URLSearchParams): QueueParams {
  const page = Number(search.get("page"));
  const pageSize = Number(search.get("pageSize"));
  return {
    status: oneOf(search.get("status"), [...SETUP_STATUSES, "any"] as const, QUEUE_DEFAULTS.status),
    worst: oneOf(search.get("worst"), ["", ...FLAG_LEVELS] as const, ""),
    model: (search.get("model") ?? "").slice(0, 64),
    q: (search.get("q") ?? "").slice(0, 120),
    sort: oneOf(search.get("sort"), QUEUE_SORTS, QUEUE_DEFAULTS.sort),
    dir: oneOf(search.get("dir"), ["asc", "desc"] as const, QUEUE_DEFAULTS.dir),
    page: Number.isInteger(page) && page >= 1 ? page : 1,
    pageSize: (PAGE_SIZES as readonly number[]).includes(pageSize) ? pageSize : QUEUE_DEFAULTS.pageSize,
  };
}

/** Only what differs from the defaults goes into the URL. */
export function toSearch(params: QueueParams): string {
  const search = new URLSearchParams();
  for (const key of Object.keys(QUEUE_DEFAULTS) as (keyof QueueParams)[]) {
    if (params[key] !== QUEUE_DEFAULTS[key]) search.set(key, String(params[key]));
  }
  const text = search.toString();
  return text ? `?${text}` : "";
}

/** The API's query for these params (the API's own defaults differ: it is explicit about each). */
export function toApiQuery(params: QueueParams): string {
  const search = new URLSearchParams({
    status: params.status,
    sort: params.sort,
    dir: params.dir,
    page: String(params.page),
    pageSize: String(params.pageSize),
  });
  if (params.worst) search.set("worst", params.worst);
  if (params.model) search.set("model", params.model);
  if (params.q) search.set("q", params.q);
  return search.toString();
}
