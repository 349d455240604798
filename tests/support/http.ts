import { randomInt } from "node:crypto";
import { DEMO_PASSWORD } from "../../db/seed-data";

// Each test file loads this module afresh, so a counter from zero would give the same addresses in
// every file: a file that exhausts one address's sign-in limit would lock out the next file's person
// with that address. A random start per file keeps them apart.
let addressCounter = randomInt(0, 60_000);

/** A fake client address per simulated person, so per-address sign-in limits count them apart. */
export function nextClientAddress(): string {
  addressCounter += 1;
  return `10.88.${Math.floor(addressCounter / 250) % 250}.${(addressCounter % 250) + 1}`;
}

/** A minimal cookie-keeping client for the real route handlers of the running server. */
export class ApiClient {
  private cookies = new Map<string, string>();

  /** `address`: the client address it claims; a test file may keep its own range apart from the others'. */
  constructor(
    private readonly baseURL: string,
    readonly address = nextClientAddress(),
  ) {}

  async request(method: string, pathname: string, body?: unknown, headers: Record<string, string> = {}): Promise<Response> {
    const response = await fetch(new URL(pathname, this.baseURL), {
      method,
      headers: {
        origin: this.baseURL,
        "x-forwarded-for": this.address,
        ...(body === undefined ? {} : { "content-type": "application/json" }),
        ...(this.cookies.size ? { cookie: [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ") } : {}),
        ...headers,
      },
      body: body === undefined ? undefined : typeof body === "string" ? body : JSON.stringify(body),
      redirect: "manual",
    });
    for (const line of response.headers.getSetCookie()) {
      const [pair] = line.split(";");
      const eq = pair.indexOf("=");
      this.cookies.set(pair.slice(0, eq), pair.slice(eq + 1));
    }
    return response;
  }

  /** The session cookies, for a request made without this client (e.g. a raw streamed upload). */
  cookieHeader(): string {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
  }

  /** A multipart upload through fetch, which sends Content-Length. */
  async upload(pathname: string, form: FormData): Promise<Response> {
    return fetch(new URL(pathname, this.baseURL), {
      method: "POST",
      headers: { origin: this.baseURL, "x-forwarded-for": this.address, ...(this.cookies.size ? { cookie: this.cookieHeader() } : {}) },
      body: form,
      redirect: "manual",
    });
  }

  get(pathname: string): Promise<Response> {
    return this.request("GET", pathname);
  }

  async signIn(email: string, password = DEMO_PASSWORD): Promise<Response> {
    return this.request("POST", "/api/auth/sign-in/email", { email, password });
  }

  hasSession(): boolean {
    return [...this.cookies.keys()].some((k) => k.includes("session_token"));
  }
}
