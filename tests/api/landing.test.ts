import { describe, expect, inject, it } from "vitest";
import { SIGNED_IN_HEADER } from "@/lib/auth/signed-in-header";
import { ApiClient } from "../support/http";

// The landing page is served by the Pages Router with its runtime switched off (pages/index.tsx):
// it must reach the browser as plain HTML and CSS, and still tell a stranger from a signed-in person.

const baseURL = inject("baseURL");
const HEADING = "Know where the mount goes before the first flight.";

/** The addresses the header's nav links to, in order. */
function navLinks(html: string): string[] {
  const nav = /<nav\b[^>]*>([\s\S]*?)<\/nav>/.exec(html)?.[1] ?? "";
  return [...nav.matchAll(/<a\b[^>]*\bhref="([^"]*)"/g)].map((match) => match[1]);
}

/** Every script the HTML loads or preloads: script tags with a source, and any address of a .js file. */
function scriptFiles(html: string): string[] {
  const tags = [...html.matchAll(/<script\b[^>]*\bsrc="([^"]*)"/g)].map((match) => match[1]);
  const addresses = [...html.matchAll(/(?:src|href)="([^"]*\.m?js(?:\?[^"]*)?)"/g)].map((match) => match[1]);
  return [...new Set([...tags, ...addresses])];
}

async function landing(client: ApiClient, path = "/", headers: Record<string, string> = {}): Promise<{ status: number; html: string }> {
  const response = await client.request("GET", path, undefined, headers);
  return { status: response.status, html: await response.text() };
}

describe("GET /", () => {
  it("returns the landing page in the site's document, with its styles and no JavaScript file", async () => {
    const response = await new ApiClient(baseURL).get("/");
    const html = await response.text();
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toMatch(/^text\/html/);
    expect(html).toContain(`<h1 class="text-4xl">${HEADING}</h1>`);
    expect(html).toMatch(/<html lang="en"/);
    expect(html).toMatch(/<title[^>]*>Trimrail<\/title>/);
    expect(html).toMatch(/<meta name="description" content="Plan, balance and review payloads under helium kite-balloons\."/);
    expect(html).toMatch(/<link rel="icon" href="\/icon\.svg"/);
    expect(html).toMatch(/<link rel="stylesheet" href="\/_next\/static\/[^"]+\.css"/);
    expect(scriptFiles(html)).toEqual([]);
    expect(html).not.toContain("__NEXT_DATA__");
  });

  it("returns sign-in and sign-up links to a stranger, to a forged session cookie and to a client that claims to be signed in", async () => {
    const client = new ApiClient(baseURL);
    const strangers: Record<string, string>[] = [{}, { cookie: "better-auth.session_token=forged.signature" }, { [SIGNED_IN_HEADER]: "1" }];
    for (const headers of strangers) {
      const { status, html } = await landing(client, "/", headers);
      expect(status, JSON.stringify(headers)).toBe(200);
      expect(navLinks(html), JSON.stringify(headers)).toEqual(["/sign-in", "/sign-up"]);
    }
  });

  it("returns a link to the setups to a signed-in customer, and the sign-in links to that session's cookie once it has signed out", async () => {
    const customer = new ApiClient(baseURL);
    expect((await customer.signIn("customer@trimrail.test")).status).toBe(200);
    const response = await customer.get("/");
    expect(response.status).toBe(200);
    // Each person's nav differs, so no shared cache may keep the page.
    expect(response.headers.get("cache-control")).toMatch(/private|no-store/);
    expect(navLinks(await response.text())).toEqual(["/setups"]);

    const sessionCookie = customer.cookieHeader();
    expect((await customer.request("POST", "/api/auth/sign-out", {})).status).toBe(200);
    const stale = await landing(new ApiClient(baseURL), "/", { cookie: sessionCookie });
    expect(stale.status).toBe(200);
    expect(navLinks(stale.html)).toEqual(["/sign-in", "/sign-up"]);
  });

  it("returns the page, never a 500, for query strings that do not decode or name Next's own parameters", async () => {
    const client = new ApiClient(baseURL);
    for (const path of [
      "/?%",
      "/?q=%E0%A4%A",
      "/?%FF=%FE",
      "/?a[]=1&a[]=2&a=3",
      "/?__nextDataReq=1",
      "/?_rsc=1",
      "/?next=https://evil.example",
    ]) {
      const { status, html } = await landing(client, path);
      expect(status, path).toBe(200);
      expect(html, path).toContain(HEADING);
    }
  });
});
