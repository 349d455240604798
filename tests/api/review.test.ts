import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { openDatabase } from "@/db/index";
import { ApiClient } from "../support/http";
import { pdfText } from "../support/pdf-text";
import { readSetupOver, submittedSetup } from "../support/setup-fixtures";

const baseURL = inject("baseURL");

interface ErrorBody {
  error: { code: string; message: string; issues?: Array<{ path: string; message: string }> };
}
interface QueueBody {
  rows: Array<{
    id: string;
    name: string;
    ownerName: string;
    modelName: string;
    status: string;
    payloadMassKg: number;
    freeLiftRatio: number | null;
    worstFlag: string;
    submittedAt: string;
  }>;
  total: number;
  page: number;
  pageSize: number;
}
interface ThreadBody {
  items: Array<{ kind: string; body: string; authorName: string; decision: string | null }>;
}

let database: ReturnType<typeof openDatabase>;
const people: Record<"wren" | "tobin" | "support" | "orrin" | "maker" | "stranger", ApiClient> = {} as never;

beforeAll(async () => {
  database = openDatabase(inject("databaseUrl"));
  for (const [key, email] of [
    ["wren", "customer@trimrail.test"],
    ["tobin", "tobin@trimrail.test"],
    ["support", "support@trimrail.test"],
    ["orrin", "orrin@trimrail.test"],
    ["maker", "maker@trimrail.test"],
  ] as const) {
    people[key] = new ApiClient(baseURL);
    expect((await people[key].signIn(email)).status, email).toBe(200);
  }
  people.stranger = new ApiClient(baseURL);
});
afterAll(() => database.client.close());

async function row(id: string): Promise<Record<string, unknown>> {
  const result = await database.client.execute({
    sql: "select status, version, name, mount_position_x_m from setups where id = ?",
    args: [id],
  });
  return { ...result.rows[0] };
}

async function outboxFor(to: string, subjectPart: string): Promise<Array<{ subject: string; text_body: string }>> {
  const result = await database.client.execute({
    sql: "select subject, text_body from mail_outbox where to_address = ? and subject like ? order by created_at",
    args: [to, `%${subjectPart}%`],
  });
  return result.rows.map((r) => ({ subject: String(r.subject), text_body: String(r.text_body) }));
}

const decide = (client: ApiClient, id: string, body: Record<string, unknown>) => client.request("POST", `/api/setups/${id}/decision`, body);

describe("the review loop over HTTP", () => {
  it("returns each step's status when support sends a setup back with a reason, the owner fixes and resubmits, and support approves", async () => {
    const setup = await submittedSetup(database.db, people.wren, { from: "set-wren-cam", name: "Review loop camera" });
    expect(setup.status).toBe("submitted");
    // support was told of the submission
    expect((await outboxFor("support@trimrail.test", "Review loop camera")).length).toBe(1);

    const queue = (await (await people.support.get(`/api/review/queue?q=${encodeURIComponent("Review loop")}`)).json()) as QueueBody;
    expect(queue.rows.map((r) => r.id)).toContain(setup.id);
    expect(queue.rows.find((r) => r.id === setup.id)?.ownerName).toBe("Wren Halloway");

    const noReason = await decide(people.support, setup.id, { decision: "changes_requested", reason: "no", version: setup.version });
    expect(noReason.status).toBe(400);
    expect((((await noReason.json()) as ErrorBody).error.issues ?? []).map((i) => i.path)).toContain("reason");
    expect((await row(setup.id)).status).toBe("submitted");

    const reason = "Move the mount 2 cm forward and top the fill up before you fly.";
    const sentBack = await decide(people.support, setup.id, {
      decision: "changes_requested",
      reason,
      reasonCodes: ["trim-calm", "other"],
      version: setup.version,
    });
    expect(sentBack.status).toBe(200);
    expect((await row(setup.id)).status).toBe("changes_requested");
    const mails = await outboxFor("customer@trimrail.test", "Review loop camera");
    expect(mails.map((m) => m.subject)).toContain("Changes requested: Review loop camera");
    expect(mails.find((m) => m.subject.startsWith("Changes requested"))?.text_body).toContain(reason);

    // the owner reads the reason in the thread
    const thread = (await (await people.wren.get(`/api/setups/${setup.id}/comments`)).json()) as ThreadBody;
    expect(thread.items.at(-1)).toMatchObject({
      kind: "decision",
      decision: "changes_requested",
      body: reason,
      authorName: "Sunniva Rook",
    });

    // the owner fixes: still changes_requested until resubmitted
    const current = await readSetupOver(people.wren, setup.id);
    const fixed = await people.wren.request("PUT", `/api/setups/${setup.id}`, {
      version: current.version,
      draft: { ...current.draft, gas: { ...current.draft.gas, fillFraction: 1 } },
    });
    expect(fixed.status).toBe(200);
    expect((await row(setup.id)).status).toBe("changes_requested");
    const afterFix = await readSetupOver(people.wren, setup.id);
    const resubmit = await people.wren.request("POST", `/api/setups/${setup.id}/submit`, { version: afterFix.version });
    expect(resubmit.status).toBe(200);
    const resubmitted = await readSetupOver(people.wren, setup.id);

    // a decision on the version before the resubmit is stale
    const stale = await decide(people.orrin, setup.id, { decision: "approved", reason: "", version: afterFix.version });
    expect(stale.status).toBe(409);
    expect(((await stale.json()) as ErrorBody).error.message).toMatch(/saved this setup since you opened it/);
    expect((await row(setup.id)).status).toBe("submitted");

    const approved = await decide(people.orrin, setup.id, {
      decision: "approved",
      reason: "Balanced; keep the safety line on.",
      version: resubmitted.version,
    });
    expect(approved.status).toBe(200);
    expect((await row(setup.id)).status).toBe("approved");
    const again = await decide(people.support, setup.id, { decision: "approved", reason: "", version: resubmitted.version });
    expect(again.status).toBe(409);

    const history = (await (await people.wren.get(`/api/setups/${setup.id}/history`)).json()) as {
      entries: Array<{ action: string; actorName: string; detail: Record<string, unknown> }>;
    };
    const transitions = history.entries
      .filter((e) => e.detail.from !== e.detail.to && e.detail.to !== undefined)
      .map((e) => `${e.action}:${String(e.detail.from)}→${String(e.detail.to)}`);
    expect(transitions).toEqual([
      "setup.submit:draft→submitted",
      "setup.decision:submitted→changes_requested",
      "setup.submit:changes_requested→submitted",
      "setup.decision:submitted→approved",
    ]);
    expect(history.entries.find((e) => e.action === "setup.decision")).toMatchObject({ actorName: "Sunniva Rook", detail: { reason } });

    // an edit of an approved setup takes it back to draft: it needs a new review
    const edit = await people.wren.request("PUT", `/api/setups/${setup.id}`, { version: resubmitted.version, draft: resubmitted.draft });
    expect(edit.status).toBe(200);
    expect((await row(setup.id)).status).toBe("draft");
  });
});

describe("who may decide, comment and change", () => {
  it("returns 403 to a customer deciding, also on their own setup, and changes nothing", async () => {
    const setup = await submittedSetup(database.db, people.wren, { from: "set-wren-cam", name: "Customer cannot decide" });
    const before = await row(setup.id);
    for (const client of [people.wren, people.tobin]) {
      expect((await decide(client, setup.id, { decision: "approved", reason: "", version: setup.version })).status).toBe(403);
    }
    expect((await decide(people.stranger, setup.id, { decision: "approved", reason: "", version: setup.version })).status).toBe(401);
    expect(await row(setup.id)).toEqual(before);
  });

  it("returns 403 to support and the maker changing a customer's submitted setup by any route, and changes nothing", async () => {
    const setup = await submittedSetup(database.db, people.wren, { from: "set-wren-cam", name: "Staff cannot edit" });
    const before = await row(setup.id);
    for (const client of [people.support, people.maker]) {
      expect(
        (
          await client.request("PUT", `/api/setups/${setup.id}`, {
            version: setup.version,
            draft: { ...setup.draft, name: "Changed by staff" },
          })
        ).status,
      ).toBe(403);
      expect((await client.request("POST", `/api/setups/${setup.id}/submit`, { version: setup.version })).status).toBe(403);
      expect((await client.request("DELETE", `/api/setups/${setup.id}`)).status).toBe(403);
      expect((await client.request("POST", `/api/setups/${setup.id}/duplicate`)).status).toBe(403);
      // but they read it
      expect((await client.get(`/api/setups/${setup.id}`)).status).toBe(200);
    }
    expect(await row(setup.id)).toEqual(before);
  });

  it("returns 404 to staff for a draft that was never submitted, and to another customer for anything", async () => {
    expect((await people.support.get("/api/setups/set-wren-whip")).status).toBe(404);
    expect((await people.support.get("/api/setups/set-wren-whip/comments")).status).toBe(404);
    expect((await people.tobin.get("/api/setups/set-wren-cam/comments")).status).toBe(404);
    expect((await people.tobin.request("POST", "/api/setups/set-wren-cam/comments", { body: "Hello" })).status).toBe(404);
    expect((await people.tobin.get("/api/setups/set-wren-cam/history")).status).toBe(404);
    expect((await decide(people.support, "set-wren-whip", { decision: "approved", reason: "", version: 1 })).status).toBe(404);
  });

  it("returns 201 for comments by the owner, support and the maker, mails the others, and 400 for an empty or too long body", async () => {
    const setup = await submittedSetup(database.db, people.wren, { from: "set-wren-cam", name: "Comment thread" });
    expect(
      (await people.support.request("POST", `/api/setups/${setup.id}/comments`, { body: "Which line will you fly it on?" })).status,
    ).toBe(201);
    expect((await people.wren.request("POST", `/api/setups/${setup.id}/comments`, { body: "A 2 mm braided line, 60 m." })).status).toBe(
      201,
    );
    expect(
      (await people.maker.request("POST", `/api/setups/${setup.id}/comments`, { body: "That line is fine <b>here</b>." })).status,
    ).toBe(201);
    expect((await people.wren.request("POST", `/api/setups/${setup.id}/comments`, { body: "   " })).status).toBe(400);
    expect((await people.wren.request("POST", `/api/setups/${setup.id}/comments`, { body: "x".repeat(4001) })).status).toBe(400);
    expect((await people.stranger.request("POST", `/api/setups/${setup.id}/comments`, { body: "hi" })).status).toBe(401);

    const thread = (await (await people.wren.get(`/api/setups/${setup.id}/comments`)).json()) as ThreadBody;
    expect(thread.items.map((i) => i.body)).toEqual([
      "Which line will you fly it on?",
      "A 2 mm braided line, 60 m.",
      "That line is fine <b>here</b>.",
    ]);
    // the customer heard of both staff comments; support heard of the customer's reply and the maker's comment
    expect((await outboxFor("customer@trimrail.test", "Comment thread")).filter((m) => m.subject.startsWith("New comment")).length).toBe(2);
    expect((await outboxFor("support@trimrail.test", "Comment thread")).filter((m) => m.subject.startsWith("New comment")).length).toBe(2);
  });
});

describe("GET /api/review/queue", () => {
  it("returns 403 to customers and 401 to strangers", async () => {
    expect((await people.wren.get("/api/review/queue")).status).toBe(403);
    expect((await people.stranger.get("/api/review/queue")).status).toBe(401);
    expect((await people.maker.get("/api/review/queue")).status).toBe(200);
  });

  it("returns the same total as the database, in pages, for each status", async () => {
    for (const status of ["submitted", "approved", "changes_requested"]) {
      const counted = await database.client.execute({ sql: "select count(*) as n from setups where status = ?", args: [status] });
      const first = (await (await people.support.get(`/api/review/queue?status=${status}&pageSize=2`)).json()) as QueueBody;
      expect(first.total, status).toBe(Number(counted.rows[0].n));
      expect(first.rows.length).toBe(Math.min(2, first.total));
      expect(first.rows.every((r) => r.status === status)).toBe(true);
      const all: string[] = [];
      for (let page = 1; page <= Math.ceil(first.total / 2); page += 1) {
        const body = (await (await people.support.get(`/api/review/queue?status=${status}&pageSize=2&page=${page}`)).json()) as QueueBody;
        all.push(...body.rows.map((r) => r.id));
      }
      expect(new Set(all).size).toBe(first.total);
    }
  });

  it("returns rows in the order asked for, filtered by worst flag and model", async () => {
    const byMass = (await (
      await people.support.get("/api/review/queue?status=any&sort=payloadMassKg&dir=desc&pageSize=100")
    ).json()) as QueueBody;
    const masses = byMass.rows.map((r) => r.payloadMassKg);
    expect(masses).toEqual([...masses].sort((a, b) => b - a));
    const oldestFirst = (await (
      await people.support.get("/api/review/queue?status=any&sort=waiting&dir=desc&pageSize=100")
    ).json()) as QueueBody;
    const times = oldestFirst.rows.map((r) => Date.parse(r.submittedAt));
    expect(times).toEqual([...times].sort((a, b) => a - b));
    const cautions = (await (await people.support.get("/api/review/queue?status=any&worst=caution&pageSize=100")).json()) as QueueBody;
    expect(cautions.rows.every((r) => r.worstFlag === "caution")).toBe(true);
    const small = (await (await people.support.get("/api/review/queue?status=any&model=mdl-ridge-06&pageSize=100")).json()) as QueueBody;
    expect(small.rows.length).toBeGreaterThan(0);
    expect(small.rows.every((r) => r.modelName === "Ridge 0.6")).toBe(true);
    const search = (await (await people.support.get("/api/review/queue?status=any&q=Kasper")).json()) as QueueBody;
    expect(search.rows.length).toBeGreaterThan(0);
    expect(search.rows.every((r) => r.ownerName.includes("Kasper"))).toBe(true);
    const wildcard = (await (await people.support.get(`/api/review/queue?status=any&q=${encodeURIComponent("%")}`)).json()) as QueueBody;
    expect(wildcard.total).toBe(0);
  });

  it("returns 400 with the parameter's name for a bad query string", async () => {
    for (const [query, param] of [
      ["pageSize=101", "pageSize"],
      ["page=0", "page"],
      ["sort=owner", "sort"],
      ["status=lost", "status"],
      ["worst=red", "worst"],
      ["dir=up", "dir"],
      ["color=blue", ""],
    ]) {
      const response = await people.support.get(`/api/review/queue?${query}`);
      expect(response.status, query).toBe(400);
      const error = ((await response.json()) as ErrorBody).error;
      if (param)
        expect(
          error.issues?.map((i) => i.path),
          query,
        ).toContain(param);
    }
  });
});

describe("GET /api/setups/:id/report.pdf", () => {
  it("returns the PDF to the owner and to staff once submitted, with the review state, and 404/401 to others", async () => {
    const draftPdf = await people.wren.get("/api/setups/set-wren-whip/report.pdf");
    expect(draftPdf.status).toBe(200);
    expect(draftPdf.headers.get("content-type")).toBe("application/pdf");
    expect(draftPdf.headers.get("content-disposition")).toMatch(/^attachment; filename="field-report-set-wren-whip\.pdf"$/);
    expect(await pdfText(new Uint8Array(await draftPdf.arrayBuffer()))).toContain("NOT REVIEWED");
    expect((await people.support.get("/api/setups/set-wren-whip/report.pdf")).status).toBe(404);
    expect((await people.tobin.get("/api/setups/set-wren-cam/report.pdf")).status).toBe(404);
    expect((await people.stranger.get("/api/setups/set-wren-cam/report.pdf")).status).toBe(401);

    const setup = await submittedSetup(database.db, people.wren, { from: "set-wren-cam", name: "Report after approval" });
    expect(
      (await decide(people.support, setup.id, { decision: "approved", reason: "Balanced and light.", version: setup.version })).status,
    ).toBe(200);
    for (const client of [people.wren, people.support, people.maker]) {
      const response = await client.get(`/api/setups/${setup.id}/report.pdf`);
      expect(response.status).toBe(200);
      const text = await pdfText(new Uint8Array(await response.arrayBuffer()));
      expect(text).toContain("APPROVED FOR FIRST FLIGHT");
      expect(text).toContain("Sunniva Rook");
      expect(text).toContain("Report after approval");
    }
  });
});
