import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { openDatabase } from "@/db/index";
import { DEMO_PASSWORD } from "../../db/seed-data";
import { startAppServer, type AppServer } from "../support/app-server";
import { ApiClient } from "../support/http";
import { uniqueEmail } from "../support/sign-up";

// The sign-in limit over real HTTP. The shared server trusts x-forwarded-for as a proxy's header
// (tests/support/global-setup.ts); a second server here trusts no header, as a bare deployment,
// so every test client is the one loopback connection and x-forwarded-for is only client noise.

const mainURL = inject("baseURL");

const WINDOW_S = 8;
const ADDRESS_MAX = 6;
const ACCOUNT_MAX = 4;

let bare: AppServer;

beforeAll(async () => {
  bare = await startAppServer({
    build: false,
    env: {
      TRIMRAIL_TRUSTED_PROXY_HEADER: "",
      TRIMRAIL_SIGN_IN_WINDOW_S: String(WINDOW_S),
      TRIMRAIL_SIGN_IN_MAX: String(ADDRESS_MAX),
      TRIMRAIL_SIGN_IN_ACCOUNT_MAX: String(ACCOUNT_MAX),
    },
  });
});
afterAll(async () => {
  await bare?.stop();
});

let spoofCounter = 0;
/** A request that claims a different address each time, the way the bypass worked. */
const spoofed = () => ({ "x-forwarded-for": `198.51.100.${(spoofCounter++ % 250) + 1}` });

async function signInAs(baseURL: string, email: string, password: string, headers: Record<string, string> = {}): Promise<Response> {
  return new ApiClient(baseURL).request("POST", "/api/auth/sign-in/email", { email, password }, headers);
}

async function rowCount(databaseUrl: string, table: string): Promise<number> {
  const { client } = openDatabase(databaseUrl);
  try {
    return Number((await client.execute(`select count(*) as n from ${table}`)).rows[0].n);
  } finally {
    client.close();
  }
}

describe("the sign-in limit keyed on the connection (no trusted proxy header)", () => {
  it("never answers 429 to 30 successful sign-ins in a row, from one address", async () => {
    const statuses: number[] = [];
    const started = performance.now();
    for (let i = 0; i < 30; i += 1) statuses.push((await signInAs(bare.baseURL, "support@trimrail.test", DEMO_PASSWORD, spoofed())).status);
    console.info(`[sign-in-limit] 30 sign-ins in ${Math.round(performance.now() - started)} ms`);
    expect(statuses).toEqual(new Array(30).fill(200));
  });

  it("ignores a new X-Forwarded-For per request and answers 429 after the allowed failures", async () => {
    const statuses: number[] = [];
    for (let i = 0; i < ADDRESS_MAX; i += 1) {
      statuses.push((await signInAs(bare.baseURL, uniqueEmail("rotating"), "wrong-password-here", spoofed())).status);
    }
    expect(statuses).toEqual(new Array(ADDRESS_MAX).fill(401));

    const refused = await signInAs(bare.baseURL, uniqueEmail("rotating"), "wrong-password-here", spoofed());
    expect(refused.status).toBe(429);
    const retryAfterS = Number(refused.headers.get("retry-after"));
    expect(retryAfterS).toBeGreaterThan(0);
    expect(retryAfterS).toBeLessThanOrEqual(WINDOW_S);
    const body = (await refused.json()) as { code: string; message: string };
    expect(body.code).toBe("TOO_MANY_SIGN_IN_ATTEMPTS");
    expect(body.message).toMatch(/^Too many failed sign-in attempts\. Try again in \d+ seconds/);

    // Writing the server's own header by hand does not help either.
    const forged = await signInAs(bare.baseURL, uniqueEmail("rotating"), "wrong-password-here", {
      "x-trimrail-client-address": "203.0.113.77",
      "x-trimrail-client-address-proof": "guess",
    });
    expect(forged.status).toBe(429);
  });

  it("deletes the counters once their window has passed, and the address may try again", async () => {
    const before = await rowCount(bare.databaseUrl, "sign_in_attempts");
    expect(before).toBeGreaterThan(ADDRESS_MAX); // the address and one per account tried above
    await new Promise((r) => setTimeout(r, (WINDOW_S + 1) * 1000));
    expect((await signInAs(bare.baseURL, uniqueEmail("later"), "wrong-password-here", spoofed())).status).toBe(401);
    // Only this attempt's two counters are left: its account, and the connection's own address
    // (the loopback socket), not any address a header claimed.
    const { client } = openDatabase(bare.databaseUrl);
    const keys = (await client.execute("select key from sign_in_attempts order by key")).rows.map((r) => String(r.key));
    client.close();
    expect(keys).toHaveLength(2);
    expect(keys[0]).toMatch(/^account:[0-9a-f]{64}$/);
    expect(keys[1]).toBe("address:127.0.0.1");
  });

  it("keeps better-auth's limiter to one key per connection, however many header values arrive", async () => {
    const before = await rowCount(bare.databaseUrl, "rate_limit");
    for (let i = 0; i < 5; i += 1) {
      await new ApiClient(bare.baseURL).request(
        "POST",
        "/api/auth/request-password-reset",
        { email: uniqueEmail("reset"), redirectTo: "/reset-password" },
        spoofed(),
      );
    }
    expect(await rowCount(bare.databaseUrl, "rate_limit")).toBeLessThanOrEqual(before + 1);
  });
});

describe("the sign-in limit behind a trusted proxy (x-forwarded-for, the shared server)", () => {
  it("keys on the entry the proxy appended, so a client's own entries neither hide it nor lock out others", async () => {
    const addressMax = 20; // the default TRIMRAIL_SIGN_IN_MAX
    const attacker = { "x-forwarded-for": "198.51.100.1, 10.61.0.1" };
    const statuses: number[] = [];
    for (let i = 0; i <= addressMax; i += 1) {
      // The client rotates its own left-hand entry; the proxy's entry stays its real address.
      const headers = { "x-forwarded-for": `198.51.100.${i + 1}, 10.61.0.1` };
      statuses.push((await signInAs(mainURL, uniqueEmail("guess"), "wrong-password-here", i === 0 ? attacker : headers)).status);
    }
    expect(statuses.slice(0, addressMax)).toEqual(new Array(addressMax).fill(401));
    expect(statuses[addressMax]).toBe(429);

    // Another client behind the same proxy, sending the very same left-hand entry, is not affected.
    const neighbour = { "x-forwarded-for": "198.51.100.1, 10.61.0.2" };
    expect((await signInAs(mainURL, uniqueEmail("guess"), "wrong-password-here", neighbour)).status).toBe(401);
    expect((await signInAs(mainURL, "tobin@trimrail.test", DEMO_PASSWORD, neighbour)).status).toBe(200);
  });

  it("locks one account against wrong passwords from many addresses, and only that account", async () => {
    const accountMax = 10; // the default TRIMRAIL_SIGN_IN_ACCOUNT_MAX
    const email = uniqueEmail("target");
    const statuses: number[] = [];
    for (let i = 0; i <= accountMax; i += 1) statuses.push((await new ApiClient(mainURL).signIn(email, `wrong-${i}-password`)).status);
    expect(statuses.slice(0, accountMax)).toEqual(new Array(accountMax).fill(401));
    expect(statuses[accountMax]).toBe(429);
    // The same addresses' owners can still sign in to their own accounts.
    expect((await new ApiClient(mainURL).signIn("customer@trimrail.test")).status).toBe(200);
  });
});
