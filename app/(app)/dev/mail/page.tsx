import Link from "next/link";
import { notFound } from "next/navigation";
import { connection } from "next/server";
import { EmptyState } from "@/components/ui/empty-state";
import { requirePageViewer } from "@/lib/auth/guard";
import { MAKER_ONLY } from "@/lib/domain";
import { listCapturedMail } from "@/lib/mail/captured";
import { capturedMailDir } from "@/lib/mail/config";

export const metadata = { title: "Captured mail" };

const cell = "border-t border-hairline px-3 py-2";
const when = (at: Date) => `${at.toISOString().slice(0, 19).replace("T", " ")} UTC`;

export default async function CapturedMailPage() {
  // Decided per request from the server's environment, never at build time.
  await connection();
  const dir = capturedMailDir();
  if (!dir) notFound(); // with a real SMTP server there is nothing to show here
  await requirePageViewer(MAKER_ONLY, "/dev/mail");
  const messages = await listCapturedMail({ dir });
  return (
    <section className="space-y-4">
      <div>
        <h1 className="text-2xl">Captured mail</h1>
        <p className="text-sm text-muted">
          Every message Trimrail sent while the local SMTP fake stands in for a mail server, newest first. Nothing here left this machine.
          Folder: <code>{dir}</code>
        </p>
      </div>
      {messages.length === 0 ? (
        <EmptyState title="No mail yet">Submitting a setup, a comment, a decision, a sign-up or a password reset sends one.</EmptyState>
      ) : (
        <table className="panel w-full border-separate border-spacing-0 text-sm" data-testid="captured-mail-list">
          <thead className="text-left text-muted">
            <tr>
              <th className="px-3 py-2">Received</th>
              <th className="px-3 py-2">To</th>
              <th className="px-3 py-2">Subject</th>
            </tr>
          </thead>
          <tbody>
            {messages.map((m) => (
              <tr key={m.id} data-testid="captured-mail-row">
                <td className={`${cell} figure whitespace-nowrap`}>{when(m.receivedAt)}</td>
                <td className={cell}>{m.to}</td>
                <td className={cell}>
                  <Link href={`/dev/mail/${m.id}`} className="text-accent underline">
                    {m.subject}
                  </Link>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}
