import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { openDatabase } from "@/db/index";
import { MAX_NAME_LENGTH } from "@/lib/domain";
import { ApiClient } from "../support/http";
import { signUpAndVerify } from "../support/sign-up";

// POST /api/forms/new-setup: the Setups page's form as a browser without JavaScript posts it.
const baseURL = inject("baseURL");
const FORM = "/api/forms/new-setup";
const URLENCODED = { "content-type": "application/x-www-form-urlencoded" };

const database = openDatabase(inject("databaseUrl"));
let person: ApiClient;
let personId: string;

beforeAll(async () => {
  const email = `form-${Date.now()}-${Math.floor(Math.random() * 1e6)}@trimrail.test`;
  // New accounts confirm their address first: the captured mail's link signs the person in.
  person = await signUpAndVerify({
    baseURL,
    mailDir: inject("mailDir"),
    name: "Ilse Formwright",
    email,
    password: "quiet-harbour-lantern-93",
  });
  const found = await database.client.execute({ sql: "select id from user where email = ?", args: [email] });
  personId = String(found.rows[0]?.id);
});
afterAll(() => database.client.close());

async function namesOfOwnSetups(): Promise<string[]> {
  const rows = await database.client.execute({ sql: "select name from setups where owner_id = ? order by name", args: [personId] });
  return rows.rows.map((r) => String(r.name));
}

const postForm = (body: string, client = person, headers: Record<string, string> = {}) =>
  client.request("POST", FORM, body, { ...URLENCODED, ...headers });
const fields = (values: Record<string, string>) => new URLSearchParams(values).toString();

/** Follows a 303 as a browser would (GET) and returns the page's HTML. */
async function follow(response: Response): Promise<{ path: string; status: number; html: string }> {
  expect(response.status).toBe(303);
  const path = response.headers.get("location") ?? "";
  const page = await person.get(path);
  return { path, status: page.status, html: await page.text() };
}

describe("POST /api/forms/new-setup", () => {
  it("makes the named setup from a urlencoded post and answers 303 to its Planner", async () => {
    const response = await postForm(fields({ name: "North field camera", modelId: "mdl-ridge-06" }));
    expect(response.status).toBe(303);
    const location = response.headers.get("location") ?? "";
    expect(location).toMatch(/^\/setups\/[0-9a-f-]{36}$/);
    const id = location.split("/").pop() ?? "";
    const stored = await database.client.execute({ sql: "select owner_id, name, model_id, status from setups where id = ?", args: [id] });
    expect(stored.rows[0]).toMatchObject({ owner_id: personId, name: "North field camera", model_id: "mdl-ridge-06", status: "draft" });
    // the same core as POST /api/setups: the balance was computed and stored with it
    const result = await database.client.execute({ sql: "select count(*) as n from setup_results where setup_id = ?", args: [id] });
    expect(Number(result.rows[0]?.n)).toBe(1);
    const planner = await person.get(location);
    expect(planner.status).toBe(200);
  });

  it("takes multipart/form-data as a browser sends it", async () => {
    const form = new FormData();
    form.append("name", "Multipart mast");
    form.append("modelId", "mdl-ridge-11");
    const response = await person.upload(FORM, form);
    expect(response.status).toBe(303);
    expect(response.headers.get("location")).toMatch(/^\/setups\/[0-9a-f-]{36}$/);
    expect(await namesOfOwnSetups()).toContain("Multipart mast");
  });

  it("sends an empty name back to the list, which says so and keeps the model; nothing is written", async () => {
    const before = await namesOfOwnSetups();
    const back = await follow(await postForm(fields({ name: "   ", modelId: "mdl-ridge-11" })));
    expect(back.path).toMatch(/^\/setups\?problem=name&/);
    expect(back.status).toBe(200);
    expect(back.html).toContain("Give the setup a name.");
    expect(back.html).toMatch(/<option(?=[^>]*\bselected\b)(?=[^>]*value="mdl-ridge-11")/);
    expect(await namesOfOwnSetups()).toEqual(before);
  });

  it("sends a name that is too long back with the limit, the typed name kept in the field; nothing is written", async () => {
    const before = await namesOfOwnSetups();
    const long = `Long ${"r".repeat(MAX_NAME_LENGTH)}`;
    const back = await follow(await postForm(fields({ name: long, modelId: "mdl-ridge-06" })));
    expect(back.html).toContain(`At most ${MAX_NAME_LENGTH} characters.`);
    expect(back.html).toContain(`value="${long}"`);
    expect(back.html).toMatch(/<input(?=[^>]*aria-invalid="true")(?=[^>]*data-testid="new-setup-name")/);
    expect(await namesOfOwnSetups()).toEqual(before);
  });

  it("sends an unknown or missing model back with the model to choose, the name kept; nothing is written", async () => {
    const before = await namesOfOwnSetups();
    const unknown = await follow(await postForm(fields({ name: "Ghost envelope", modelId: "mdl-no-such-envelope" })));
    expect(unknown.path).toMatch(/^\/setups\?problem=modelId&/);
    expect(unknown.html).toContain("That envelope model is not in the catalogue: choose one from the list.");
    expect(unknown.html).toContain('value="Ghost envelope"');
    const missing = await follow(await postForm(fields({ name: "No model at all" })));
    expect(missing.path).toMatch(/^\/setups\?problem=modelId&/);
    expect(await namesOfOwnSetups()).toEqual(before);
  });

  it("answers junk with a 303 back or a 400, never a 500, and writes nothing", async () => {
    const before = await namesOfOwnSetups();
    for (const junk of ["%zz%%&&==", "\u0000\u0001\u0002", "name[]=a&name[]=b&modelId[x]=1", "draft=%7B%7D&modelId=mdl-ridge-06&name=x"]) {
      const response = await postForm(junk);
      expect(response.status, junk).toBe(303);
      expect(response.headers.get("location"), junk).toMatch(/^\/setups\?problem=/);
    }
    const brokenMultipart = await person.request("POST", FORM, "--x\r\nnot a part", { "content-type": "multipart/form-data; boundary=x" });
    expect(brokenMultipart.status).toBe(400);
    const boundaryless = await person.request("POST", FORM, "name=x", { "content-type": "multipart/form-data" });
    expect(boundaryless.status).toBe(400);
    expect(await namesOfOwnSetups()).toEqual(before);
  });

  it("refuses any other content type with 415 and an oversized form with 413; nothing is written", async () => {
    const before = await namesOfOwnSetups();
    const json = await person.request("POST", FORM, { name: "As JSON", modelId: "mdl-ridge-06" });
    expect(json.status).toBe(415);
    expect(((await json.json()) as { error: { code: string } }).error.code).toBe("unsupported_media_type");
    expect((await person.request("POST", FORM, "name=Plain", { "content-type": "text/plain" })).status).toBe(415);
    expect((await postForm(fields({ name: "Huge", modelId: "mdl-ridge-06", pad: "p".repeat(80 * 1024) }))).status).toBe(413);
    expect(await namesOfOwnSetups()).toEqual(before);
  });

  it("refuses a post from another site with 403, by Origin or by Sec-Fetch-Site; nothing is written", async () => {
    const before = await namesOfOwnSetups();
    const body = fields({ name: "Planted by another site", modelId: "mdl-ridge-06" });
    const byOrigin = await postForm(body, person, { origin: "http://elsewhere.example" });
    expect(byOrigin.status).toBe(403);
    expect(((await byOrigin.json()) as { error: { code: string } }).error.code).toBe("forbidden");
    expect((await postForm(body, person, { "sec-fetch-site": "cross-site" })).status).toBe(403);
    expect(await namesOfOwnSetups()).toEqual(before);
  });

  it("sends a stranger to the sign-in page with the way back to the list, and writes nothing", async () => {
    const count = async () => Number((await database.client.execute("select count(*) as n from setups")).rows[0]?.n);
    const before = await count();
    const stranger = await postForm(fields({ name: "Nobody's", modelId: "mdl-ridge-06" }), new ApiClient(baseURL));
    expect(stranger.status).toBe(303);
    expect(stranger.headers.get("location")).toBe("/sign-in?next=%2Fsetups");
    expect(await count()).toBe(before);
  });
});

describe("POST /api/setups with a name", () => {
  it("names the neutral start as asked, and refuses a name beside a whole draft", async () => {
    const named = await person.request("POST", "/api/setups", { modelId: "mdl-ridge-18", name: "  Ridge mast, east  " });
    expect(named.status).toBe(201);
    const { id } = (await named.json()) as { id: string };
    const stored = await database.client.execute({ sql: "select name from setups where id = ?", args: [id] });
    expect(stored.rows[0]?.name).toBe("Ridge mast, east");
    const unnamed = await person.request("POST", "/api/setups", { modelId: "mdl-ridge-18" });
    expect(unnamed.status).toBe(201);
    const empty = await person.request("POST", "/api/setups", { modelId: "mdl-ridge-18", name: "" });
    expect(empty.status).toBe(400);
    expect(((await empty.json()) as { error: { issues: { path: string; message: string }[] } }).error.issues).toContainEqual({
      path: "name",
      message: "Give the setup a name.",
    });
  });
});
