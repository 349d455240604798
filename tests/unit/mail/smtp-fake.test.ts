import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { listCapturedMail, readCapturedMail } from "@/lib/mail/captured";
import { capturedMailId } from "@/lib/mail/captured-file";
import { mailRoute } from "@/lib/mail/config";
import { createMailSender } from "@/lib/mail/transport";
import { startSmtpFake, type SmtpFake } from "../../../scripts/smtp-fake";

// Real SMTP over loopback: nodemailer as the app configures it, talking to the fake.

const dir = mkdtempSync(path.join(os.tmpdir(), "trimrail-smtp-fake-"));
let fake: SmtpFake;

beforeAll(async () => {
  fake = await startSmtpFake({ dir });
});
afterAll(async () => {
  await fake.stop();
  rmSync(dir, { recursive: true, force: true });
});

const RESET_MESSAGE = {
  to: "wren@trimrail.test",
  subject: "Reset your Trimrail password",
  text: "Choose a new password: http://localhost:3000/api/auth/reset-password/tok123?callbackURL=%2Freset-password",
  html: '<!doctype html><html><body><p>Choose a <a href="http://localhost:3000/x">new password</a>.</p></body></html>',
};

describe("startSmtpFake", () => {
  it("listens on a free port of 127.0.0.1", () => {
    expect(fake.host).toBe("127.0.0.1");
    expect(fake.port).toBeGreaterThan(0);
  });

  it("keeps a message sent through the app's transport as an .eml file with its recipient, subject and body", async () => {
    const send = createMailSender(
      mailRoute({ TRIMRAIL_SMTP_FAKE_PORT: String(fake.port), TRIMRAIL_MAIL_DIR: dir }),
      "Trimrail <no-reply@trimrail.test>",
    );
    expect(send).not.toBeNull();
    await send!(RESET_MESSAGE);

    const files = readdirSync(dir).filter((f) => capturedMailId(f));
    expect(files).toHaveLength(1);
    const raw = readFileSync(path.join(dir, files[0]), "utf8");
    expect(raw).toMatch(/^To: wren@trimrail\.test$/m);
    expect(raw).toMatch(/^Subject: Reset your Trimrail password$/m);

    const [summary] = await listCapturedMail({ dir });
    const message = await readCapturedMail({ dir, id: summary.id });
    expect(message?.to).toBe("wren@trimrail.test");
    expect(message?.from).toMatch(/^"?Trimrail"? <no-reply@trimrail\.test>$/);
    expect(message?.subject).toBe(RESET_MESSAGE.subject);
    expect(message?.text).toContain("reset-password/tok123");
    expect(message?.html).toContain("new password</a>");
  });

  it("lists the newest message first", async () => {
    const send = createMailSender({ kind: "fake", host: "127.0.0.1", port: fake.port, dir })!;
    await send({ ...RESET_MESSAGE, subject: "First of two" });
    await new Promise((r) => setTimeout(r, 5)); // file names carry the millisecond of arrival
    await send({ ...RESET_MESSAGE, subject: "Second of two" });
    const subjects = (await listCapturedMail({ dir })).map((m) => m.subject);
    expect(subjects.indexOf("Second of two")).toBeLessThan(subjects.indexOf("First of two"));
  });
});

describe("readCapturedMail", () => {
  it("returns null for an id that is not one of the fake's file names, and never reads outside the folder", async () => {
    writeFileSync(path.join(dir, "notes.eml"), "Subject: stray\r\n\r\nnot kept by the fake");
    for (const id of ["../etc/passwd", "notes", "..", "", "1700000000000-zzzzzzzz", "1700000000000-0000000a/../../x"]) {
      expect(await readCapturedMail({ dir, id }), id).toBeNull();
    }
    expect(await readCapturedMail({ dir, id: "1700000000000-0000000a" })).toBeNull(); // well formed, not kept
    expect((await listCapturedMail({ dir })).map((m) => m.subject)).not.toContain("stray");
  });

  it("lists nothing for a folder that does not exist yet", async () => {
    expect(await listCapturedMail({ dir: path.join(dir, "missing") })).toEqual([]);
  });
});

describe("mailRoute", () => {
  it("prefers SMTP_URL, then the fake's port, else no route", () => {
    expect(mailRoute({ SMTP_URL: "smtp://mail.example.test:587", TRIMRAIL_SMTP_FAKE_PORT: "2525" })).toEqual({
      kind: "smtp",
      url: "smtp://mail.example.test:587",
    });
    expect(mailRoute({ TRIMRAIL_SMTP_FAKE_PORT: "2525", TRIMRAIL_MAIL_DIR: "/tmp/m" })).toEqual({
      kind: "fake",
      host: "127.0.0.1",
      port: 2525,
      dir: "/tmp/m",
    });
    expect(mailRoute({ TRIMRAIL_SMTP_FAKE_PORT: "not-a-port" })).toEqual({ kind: "none" });
    expect(mailRoute({})).toEqual({ kind: "none" });
    expect(createMailSender({ kind: "none" })).toBeNull();
  });
});
