import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { MAKER_ONLY, ROLES, STAFF_ROLES, type Role } from "../../lib/domain";

// The app's state-changing routes, read from the files themselves: a route added later is found
// here without anyone remembering to list it, so a test that walks this list cannot skip it.

const ROOT = path.resolve(__dirname, "../..");
const MUTATING_METHODS = ["POST", "PUT", "PATCH", "DELETE"] as const;
export type MutatingMethod = (typeof MUTATING_METHODS)[number];

/** better-auth's catch-all serves its own endpoints; the JSON ones the app calls are listed by hand. */
const FRAMEWORK_ROUTE = "app/api/auth/[...all]/route.ts";

export interface MutatingRoute {
  method: MutatingMethod;
  /** The address with its dynamic segments as `[name]`, e.g. `/api/setups/[id]/submit`. */
  template: string;
  /** The roles the route's spec lets in (every role when it names none). */
  roles: readonly Role[];
  file: string;
}

function routeFilesUnder(dir: string): string[] {
  return readdirSync(path.join(ROOT, dir)).flatMap((name) => {
    const relative = path.join(dir, name);
    if (statSync(path.join(ROOT, relative)).isDirectory()) return routeFilesUnder(relative);
    return name === "route.ts" ? [relative] : [];
  });
}

/** The roles constant a route file's spec names; a file with none lets any signed-in person in. */
function rolesOf(text: string): readonly Role[] {
  const named = /roles:\s*([A-Z_]+)/.exec(text)?.[1];
  if (named === undefined) return ROLES;
  if (named === "MAKER_ONLY") return MAKER_ONLY;
  if (named === "STAFF_ROLES") return STAFF_ROLES;
  throw new Error(`a route names roles ${named}, which this list does not know yet`);
}

export function listMutatingRoutes(): MutatingRoute[] {
  return routeFilesUnder("app/api")
    .filter((file) => file !== FRAMEWORK_ROUTE)
    .sort()
    .flatMap((file) => {
      const text = readFileSync(path.join(ROOT, file), "utf8");
      const template = `/${path.dirname(file).slice("app/".length)}`;
      return MUTATING_METHODS.filter((method) => new RegExp(`export const ${method}\\b`).test(text)).map((method) => ({
        method,
        template,
        roles: rolesOf(text),
        file,
      }));
    });
}

/** better-auth's JSON endpoints that the app's pages call (components/auth/auth-requests.ts). */
export const AUTH_ENDPOINTS = [
  "/api/auth/sign-in/email",
  "/api/auth/sign-up/email",
  "/api/auth/request-password-reset",
  "/api/auth/reset-password",
  "/api/auth/sign-out",
] as const;
export type AuthEndpoint = (typeof AUTH_ENDPOINTS)[number];
