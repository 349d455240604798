import { inject, describe, expect, it } from "vitest";
import { ApiClient } from "../support/http";
import { keptMailIds, linkIn, waitForMail } from "../support/mail";
import { SIGN_UP_ANSWER, requestSignUp, uniqueEmail } from "../support/sign-up";

const baseURL = inject("baseURL");
const mailDir = inject("mailDir");
const PASSWORD = "copper-kettle-orbit";

describe("POST /api/auth/sign-up/email and /sign-in/email", () => {
  it("creates a customer account that signs in once its address is confirmed, and reads its own setups", async () => {
    const client = new ApiClient(baseURL);
    const email = uniqueEmail();
    const before = await keptMailIds(mailDir);
    const signUp = await requestSignUp(client, { name: "Pim Testrow", email, password: PASSWORD });
    expect(signUp.status).toBe(200);
    expect(await signUp.json()).toEqual(SIGN_UP_ANSWER);
    expect(client.hasSession()).toBe(false);

    // Not before the address is confirmed: the answer says so, and a fresh link is mailed.
    const early = await new ApiClient(baseURL).signIn(email, PASSWORD);
    expect(early.status).toBe(403);
    expect(((await early.json()) as { code: string }).code).toBe("EMAIL_NOT_VERIFIED");

    const mail = await waitForMail({ dir: mailDir, to: email, subject: /Confirm your e-mail address/, except: before });
    const link = linkIn(mail.text, "/api/auth/verify-email");
    const verify = await client.get(link.pathname + link.search);
    expect(verify.status).toBe(302);
    expect(client.hasSession()).toBe(true);

    const session = await client.get("/api/auth/get-session");
    const body = (await session.json()) as { user: { email: string; role: string; emailVerified: boolean } };
    expect(body.user).toMatchObject({ email, role: "customer", emailVerified: true });

    const setups = await client.get("/api/setups");
    expect(setups.status).toBe(200);
    expect(((await setups.json()) as { setups: unknown[] }).setups).toEqual([]);

    const fresh = new ApiClient(baseURL);
    expect((await fresh.signIn(email, PASSWORD)).status).toBe(200);
    expect(fresh.hasSession()).toBe(true);
  });

  it("answers a registered address exactly as a new one, and mails its holder instead", async () => {
    const fresh = uniqueEmail("fresh");
    const before = await keptMailIds(mailDir);
    const answers: Array<{ status: number; body: string; cookie: boolean }> = [];
    for (const email of ["mirela@trimrail.test", fresh]) {
      const client = new ApiClient(baseURL);
      const response = await requestSignUp(client, { name: "Someone Else", email, password: PASSWORD });
      answers.push({ status: response.status, body: await response.text(), cookie: client.hasSession() });
    }
    expect(answers[0]).toEqual(answers[1]);
    expect(answers[0]).toEqual({ status: 200, body: JSON.stringify(SIGN_UP_ANSWER), cookie: false });

    const notice = await waitForMail({ dir: mailDir, to: "mirela@trimrail.test", subject: /tried to sign up/, except: before });
    expect(notice.text).toContain("Mirela Dunstan");
    expect(linkIn(notice.text, "/sign-in").origin).toBe(baseURL);
    expect(linkIn(notice.text, "/forgot-password").origin).toBe(baseURL);
    await waitForMail({ dir: mailDir, to: fresh, subject: /Confirm your e-mail address/, except: before });

    // The account is untouched: its own password still signs in, the stranger's does not.
    expect((await new ApiClient(baseURL).signIn("mirela@trimrail.test")).status).toBe(200);
    expect((await new ApiClient(baseURL).signIn("mirela@trimrail.test", PASSWORD)).status).toBe(401);
  });

  it("takes about as long for a registered address as for a new one", async () => {
    const timings: Record<"registered" | "new", number[]> = { registered: [], new: [] };
    const registered = [
      "tobin@trimrail.test",
      "kasper@trimrail.test",
      "mirela@trimrail.test",
      "orrin@trimrail.test",
      "maker@trimrail.test",
    ];
    for (const email of registered) {
      for (const [kind, address] of [
        ["registered", email],
        ["new", uniqueEmail("timing")],
      ] as const) {
        const started = performance.now();
        const response = await requestSignUp(new ApiClient(baseURL), { name: "Tam Clockwell", email: address, password: PASSWORD });
        timings[kind].push(performance.now() - started);
        expect(response.status).toBe(200);
      }
    }
    const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];
    console.info(`[sign-up] median ms: registered ${median(timings.registered).toFixed(0)}, new ${median(timings.new).toFixed(0)}`);
    // Both hash the password (the bulk of the time); the new one also writes two rows.
    expect(Math.abs(median(timings.registered) - median(timings.new))).toBeLessThan(150);
  });

  it("refuses a wrong password with 401 and no session", async () => {
    const client = new ApiClient(baseURL);
    const response = await client.signIn("customer@trimrail.test", "not-the-password");
    expect(response.status).toBe(401);
    expect(client.hasSession()).toBe(false);
  });

  it("refuses short, blank and common passwords with 400, the reason and no account", async () => {
    const cases: Array<[string, string]> = [
      ["short", "PASSWORD_TOO_SHORT"],
      ["12345678", "PASSWORD_TOO_SHORT"],
      [" ".repeat(8), "PASSWORD_TOO_SHORT"],
      [" ".repeat(16), "PASSWORD_TOO_SHORT"],
      ["password1234", "PASSWORD_TOO_WEAK"],
      ["qwertyuiop123", "PASSWORD_TOO_WEAK"],
    ];
    for (const [password, code] of cases) {
      const client = new ApiClient(baseURL);
      const email = uniqueEmail();
      const response = await requestSignUp(client, { name: "Xan Weakley", email, password });
      expect(response.status, JSON.stringify(password)).toBe(400);
      const body = (await response.json()) as { code: string; message: string };
      expect(body.code, JSON.stringify(password)).toBe(code);
      expect(body.message).toMatch(/at least 10 characters|too easy to guess/i);
      // No account: signing in finds nothing to confirm (401, not 403).
      expect((await client.signIn(email, password)).status).toBe(401);
    }
  });

  it("rate-limits wrong passwords for one account with 429 and Retry-After", async () => {
    const client = new ApiClient(baseURL);
    const email = uniqueEmail("nobody");
    const statuses: number[] = [];
    let last: Response | undefined;
    for (let i = 0; i < 12; i += 1) {
      last = await client.signIn(email, `wrong-${i}-password`);
      statuses.push(last.status);
    }
    expect(statuses.slice(0, 10).every((s) => s === 401)).toBe(true);
    expect(statuses.slice(10)).toEqual([429, 429]);
    expect(Number(last?.headers.get("retry-after"))).toBeGreaterThan(0);
    expect(((await last!.json()) as { message: string }).message).toMatch(/Too many failed sign-in attempts\. Try again in \d+ minutes/);
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
