import { describe, expect, inject, it } from "vitest";
import { ApiClient } from "../support/http";
import { keptMailIds, waitForMail } from "../support/mail";

// /dev/mail: the maker reads what the app's SMTP fake kept; nobody else, and no other file.

const baseURL = inject("baseURL");
const mailDir = inject("mailDir");

async function signedIn(email: string): Promise<ApiClient> {
  const client = new ApiClient(baseURL);
  expect((await client.signIn(email)).status).toBe(200);
  return client;
}

async function someKeptMail() {
  const before = await keptMailIds(mailDir);
  const to = `devmail-${Date.now()}@trimrail.test`;
  const signUp = await new ApiClient(baseURL).request("POST", "/api/auth/sign-up/email", {
    name: "Per <b>Holm</b>",
    email: to,
    password: "a-long-password",
  });
  expect(signUp.status).toBe(200);
  return waitForMail({ dir: mailDir, to, except: before });
}

describe("/dev/mail", () => {
  it("lists captured messages for the maker and shows one, its HTML in a sandboxed frame", async () => {
    const mail = await someKeptMail();
    const maker = await signedIn("maker@trimrail.test");

    const list = await maker.get("/dev/mail");
    expect(list.status).toBe(200);
    const listHtml = await list.text();
    expect(listHtml).toContain('data-testid="captured-mail-list"');
    expect(listHtml).toContain(`/dev/mail/${mail.id}`);

    const one = await maker.get(`/dev/mail/${mail.id}`);
    expect(one.status).toBe(200);
    const html = await one.text();
    expect(html).toContain("Confirm your e-mail address for Trimrail");
    expect(html).toMatch(/<iframe[^>]*sandbox=""[^>]*srcDoc=|<iframe[^>]*srcdoc=[^>]*sandbox=""/i);
    // The name with markup reaches the page only escaped, twice over inside the frame's srcdoc.
    expect(html).not.toContain("<b>Holm</b>");
  });

  it("answers a customer and support with 403 and a stranger with the sign-in redirect", async () => {
    for (const email of ["customer@trimrail.test", "support@trimrail.test"]) {
      expect((await (await signedIn(email)).get("/dev/mail")).status, email).toBe(403);
    }
    const stranger = await new ApiClient(baseURL).get("/dev/mail");
    expect([303, 307]).toContain(stranger.status);
    expect(stranger.headers.get("location")).toContain("/sign-in");
  });

  it("answers 404 for an id that is not a kept message, path tricks included", async () => {
    const maker = await signedIn("maker@trimrail.test");
    for (const id of ["1700000000000-0000000a", "..%2F..%2Fetc%2Fpasswd", "..%2Fapp.db", "notes", "1700000000000-0000000A"]) {
      expect((await maker.get(`/dev/mail/${id}`)).status, id).toBe(404);
    }
  });
});
