import { ReadonlyURLSearchParams, usePathname, useSearchParams } from "next/navigation";

// Next types usePathname and useSearchParams as possibly null once the project has a pages/ folder
// (the landing page lives there): a Pages Router page may call them before its router is ready.
// The components that use these two render under app/ only, where both are always known; the
// empty value stands in for a case that cannot arise there, instead of a null check in each caller.

const NO_SEARCH = new ReadonlyURLSearchParams();

/** The path of the App Router page being shown. */
export function useAppPathname(): string {
  return usePathname() ?? "";
}

/** The query of the App Router page being shown. */
export function useAppSearchParams(): ReadonlyURLSearchParams {
  return useSearchParams() ?? NO_SEARCH;
}
