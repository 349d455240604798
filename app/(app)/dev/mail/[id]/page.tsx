import Link from "next/link";
import { notFound } from "next/navigation";
import { connection } from "next/server";
import { z } from "zod";
import { MailText } from "@/components/dev/mail-text";
import { requirePageViewer } from "@/lib/auth/guard";
import { MAKER_ONLY } from "@/lib/domain";
import { readCapturedMail } from "@/lib/mail/captured";
import { CAPTURED_MAIL_ID } from "@/lib/mail/captured-file";
import { capturedMailDir } from "@/lib/mail/config";

export const metadata = { title: "Captured message" };

// Only the fake's own file names; anything else (dots, slashes, encoded separators) is a 404.
const idSchema = z.string().regex(CAPTURED_MAIL_ID);

export default async function CapturedMessagePage({ params }: PageProps<"/dev/mail/[id]">) {
  await connection();
  const dir = capturedMailDir();
  if (!dir) notFound();
  const { id } = await params;
  await requirePageViewer(MAKER_ONLY, `/dev/mail/${encodeURIComponent(id)}`);
  const parsedId = idSchema.safeParse(id);
  if (!parsedId.success) notFound();
  const message = await readCapturedMail({ dir, id: parsedId.data });
  if (!message) notFound();
  return (
    <section className="space-y-4">
      <Link href="/dev/mail" className="text-sm text-accent underline">
        All captured mail
      </Link>
      <h1 className="text-2xl" data-testid="captured-mail-subject">
        {message.subject}
      </h1>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-muted">From</dt>
        <dd>{message.from}</dd>
        <dt className="text-muted">To</dt>
        <dd data-testid="captured-mail-to">{message.to}</dd>
        <dt className="text-muted">Received</dt>
        <dd className="figure">{message.receivedAt.toISOString().slice(0, 19).replace("T", " ")} UTC</dd>
      </dl>
      <h2 className="text-lg">Plain text</h2>
      <MailText text={message.text} />
      {message.html && (
        <>
          <h2 className="text-lg">HTML</h2>
          {/* sandbox="" : no scripts, no forms, no navigation, its own origin; the message can only be looked at. */}
          <iframe
            sandbox=""
            srcDoc={message.html}
            title={`HTML of “${message.subject}”`}
            className="panel h-[32rem] w-full"
            data-testid="captured-mail-html"
          />
        </>
      )}
    </section>
  );
}
