import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

// The house rule made checkable: every route handler is made by the one wrapper (lib/server/route.ts),
// so each runs parse → session → role → core → Result and answers a typed 500 for the unexpected.

const ROOT = path.resolve(__dirname, "../../..");
const HTTP_METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE", "HEAD", "OPTIONS"] as const;
// better-auth serves its own endpoints (sign-in, sign-up, sign-out, session); they are its handler, not ours.
const FRAMEWORK_HANDLERS = new Set(["app/api/auth/[...all]/route.ts"]);

function filesUnder(dir: string, keep: (file: string) => boolean): string[] {
  return readdirSync(path.join(ROOT, dir)).flatMap((name) => {
    const relative = path.join(dir, name);
    if (statSync(path.join(ROOT, relative)).isDirectory()) return filesUnder(relative, keep);
    return keep(relative) ? [relative] : [];
  });
}

const routeFiles = filesUnder("app", (f) => /(^|\/)route\.tsx?$/.test(f));
const sourceFiles = ["app", "components", "lib", "pages"].flatMap((dir) => filesUnder(dir, (f) => /\.tsx?$/.test(f)));

describe("route handlers", () => {
  it("finds the route handlers of the app", () => {
    expect(routeFiles).toContain("app/api/setups/route.ts");
    expect(routeFiles).toContain("app/api/setups/[id]/route.ts");
    expect(routeFiles.length).toBeGreaterThanOrEqual(8);
  });

  for (const file of routeFiles.filter((f) => !FRAMEWORK_HANDLERS.has(f))) {
    it(`returns every handler of ${file} from route()`, () => {
      const text = readFileSync(path.join(ROOT, file), "utf8");
      const exported = HTTP_METHODS.filter((m) => new RegExp(`export\\s+(async\\s+)?(function|const|let|var)\\s+${m}\\b`).test(text));
      expect(exported.length, "a route file exports at least one method").toBeGreaterThan(0);
      for (const method of exported) {
        expect(text, `${method} must be \`export const ${method} = route(...)\``).toMatch(new RegExp(`export const ${method} = route\\(`));
      }
      expect(text).toMatch(/from "@\/lib\/server\/route"/);
      // No handler reaches the database or the session itself: it hands parsed input to a core function.
      expect(text).not.toMatch(/from "@\/db/);
      expect(text).not.toMatch(/getViewer|auth\.api/);
    });
  }
});

describe("server actions", () => {
  it("returns no file with 'use server': UI mutations go through the route handlers (DEVELOPERS.md)", () => {
    const withActions = sourceFiles.filter((f) => /^\s*["']use server["']/m.test(readFileSync(path.join(ROOT, f), "utf8")));
    expect(withActions).toEqual([]);
  });
});

describe("client code", () => {
  it("returns no client component that imports db/ or the server core", () => {
    const clientFiles = sourceFiles.filter((f) => /^\s*["']use client["']/m.test(readFileSync(path.join(ROOT, f), "utf8")));
    expect(clientFiles.length).toBeGreaterThan(10);
    for (const file of clientFiles) {
      const text = readFileSync(path.join(ROOT, file), "utf8");
      expect(text, file).not.toMatch(/from "@\/db\//);
      expect(text, file).not.toMatch(/from "@\/lib\/server\//);
    }
  });
});
