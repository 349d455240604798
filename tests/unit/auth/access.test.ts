import { describe, expect, it } from "vitest";
import { checkAccess, type Viewer } from "@/lib/auth/access";
import { MAKER_ONLY, STAFF_ROLES } from "@/lib/domain";
import { navItemsFor } from "@/components/shell/nav-items";

const viewerWith = (role: Viewer["role"]): Viewer => ({ id: "u1", name: "Test", email: "t@example.test", role, unitSystem: "metric" });

describe("checkAccess", () => {
  it("returns unauthenticated when there is no session", () => {
    expect(checkAccess(null)).toBe("unauthenticated");
    expect(checkAccess(null, STAFF_ROLES)).toBe("unauthenticated");
  });

  it("returns ok for any signed-in role when no roles are named", () => {
    for (const role of ["customer", "support", "maker"] as const) expect(checkAccess(viewerWith(role))).toBe("ok");
  });

  it("returns forbidden when the role is not in the allowed list", () => {
    expect(checkAccess(viewerWith("customer"), STAFF_ROLES)).toBe("forbidden");
    expect(checkAccess(viewerWith("support"), MAKER_ONLY)).toBe("forbidden");
    expect(checkAccess(viewerWith("support"), STAFF_ROLES)).toBe("ok");
    expect(checkAccess(viewerWith("maker"), MAKER_ONLY)).toBe("ok");
  });
});

describe("navItemsFor", () => {
  it("returns each role's screens", () => {
    const labels = (role: Viewer["role"]) => navItemsFor(role).map((i) => i.label);
    expect(labels("customer")).toEqual(["Setups"]);
    expect(labels("support")).toEqual(["Setups", "Review desk", "Insight"]);
    expect(labels("maker")).toEqual(["Setups", "Review desk", "Workshop", "Insight"]);
  });
});
