import { inject, describe, expect, it } from "vitest";
import { ApiClient } from "../support/http";

const baseURL = inject("baseURL");
const uniqueEmail = () => `new-${Date.now()}-${Math.floor(Math.random() * 1e6)}@trimrail.test`;

describe("POST /api/auth/sign-up/email and /sign-in/email", () => {
  it("creates a customer account, signs it in and lets it read its own setups", async () => {
    const client = new ApiClient(baseURL);
    const email = uniqueEmail();
    const signUp = await client.request("POST", "/api/auth/sign-up/email", { name: "Pim Testrow", email, password: "a-long-password" });
    expect(signUp.status).toBe(200);
    expect(client.hasSession()).toBe(true);

    const session = await client.get("/api/auth/get-session");
    const body = (await session.json()) as { user: { email: string; role: string } };
    expect(body.user.email).toBe(email);
    expect(body.user.role).toBe("customer");

    const setups = await client.get("/api/setups");
    expect(setups.status).toBe(200);
    expect(((await setups.json()) as { setups: unknown[] }).setups).toEqual([]);

    const fresh = new ApiClient(baseURL);
    expect((await fresh.signIn(email, "a-long-password")).status).toBe(200);
    expect(fresh.hasSession()).toBe(true);
  });

  it("refuses a wrong password with 401 and no session", async () => {
    const client = new ApiClient(baseURL);
    const response = await client.signIn("customer@trimrail.test", "not-the-password");
    expect(response.status).toBe(401);
    expect(client.hasSession()).toBe(false);
  });

  it("refuses a malformed sign-up with 400 and creates no account", async () => {
    const client = new ApiClient(baseURL);
    const email = uniqueEmail();
    const response = await client.request("POST", "/api/auth/sign-up/email", { name: "X", email, password: "short" });
    expect(response.status).toBe(400);
    expect((await client.signIn(email, "short")).status).toBe(401);
  });

  it("rate-limits repeated sign-in attempts from one address with 429", async () => {
    const client = new ApiClient(baseURL);
    const statuses: number[] = [];
    for (let i = 0; i < 14; i += 1) statuses.push((await client.signIn("support@trimrail.test", `wrong-${i}-password`)).status);
    expect(statuses.slice(0, 3).every((s) => s === 401)).toBe(true);
    expect(statuses).toContain(429);
  });
});

describe("role checks on the server", () => {
  it("answers an anonymous call to a protected route with 401", async () => {
    const anonymous = new ApiClient(baseURL);
    for (const path of ["/api/setups", "/api/review/queue"]) {
      const response = await anonymous.get(path);
      expect(response.status, path).toBe(401);
      expect(((await response.json()) as { error: { code: string } }).error.code).toBe("unauthenticated");
    }
  });

  it("answers a customer on a support route and on a maker route with 403", async () => {
    const customer = new ApiClient(baseURL);
    expect((await customer.signIn("customer@trimrail.test")).status).toBe(200);
    expect((await customer.get("/api/review/queue")).status).toBe(403);
    const roleChange = await customer.request("PUT", "/api/users/usr-customer-2/role", { role: "maker" });
    expect(roleChange.status).toBe(403);
  });

  it("lets support read the review queue of submitted setups from every customer", async () => {
    const support = new ApiClient(baseURL);
    expect((await support.signIn("support@trimrail.test")).status).toBe(200);
    const response = await support.get("/api/review/queue");
    expect(response.status).toBe(200);
    // The queue answers a page of rows (the review desk's list), submitted setups by default.
    const { rows: setups } = (await response.json()) as { rows: Array<{ status: string; ownerName: string }> };
    expect(setups.length).toBeGreaterThan(0);
    expect(setups.every((s) => s.status === "submitted")).toBe(true);
    expect(new Set(setups.map((s) => s.ownerName)).size).toBeGreaterThan(1);
  });

  it("lets the maker change a role, and refuses a bad role with 400 without writing", async () => {
    const maker = new ApiClient(baseURL);
    expect((await maker.signIn("maker@trimrail.test")).status).toBe(200);

    const bad = await maker.request("PUT", "/api/users/usr-support-2/role", { role: "admin" });
    expect(bad.status).toBe(400);
    const notJson = await maker.request("PUT", "/api/users/usr-support-2/role", "{role:");
    expect(notJson.status).toBe(400);

    const orrin = new ApiClient(baseURL);
    await orrin.signIn("orrin@trimrail.test");
    expect((await orrin.get("/api/review/queue")).status).toBe(200); // still support

    const good = await maker.request("PUT", "/api/users/usr-support-2/role", { role: "customer" });
    expect(good.status).toBe(200);
    expect((await orrin.get("/api/review/queue")).status).toBe(403); // the role is read per request

    const back = await maker.request("PUT", "/api/users/usr-support-2/role", { role: "support" });
    expect(back.status).toBe(200);
    expect((await orrin.get("/api/review/queue")).status).toBe(200);

    const missing = await maker.request("PUT", "/api/users/nobody/role", { role: "support" });
    expect(missing.status).toBe(404);
  });
});
