import "server-only";
import { enqueueMailNow } from "@/db/queries/mail";
import { kickMailDelivery } from "./deliver";
import { passwordResetMail, verifyAddressMail, type MailContent } from "./templates";

// better-auth's mail hooks (lib/auth/server.ts). They queue the message and return: the person's
// request never waits for SMTP, and a failure to queue is logged, never turned into a failed
// sign-up or a different answer to a reset request.

interface AuthMailInput {
  user: { email: string; name: string };
  url: string;
}

async function queue(kind: string, to: string, content: MailContent): Promise<void> {
  try {
    await enqueueMailNow([{ kind, to, content }]);
    kickMailDelivery();
  } catch (error) {
    console.error(`[mail] could not queue ${kind} for ${to}:`, error);
  }
}

export async function sendPasswordResetMail({ user, url }: AuthMailInput): Promise<void> {
  await queue("password-reset", user.email, passwordResetMail({ name: user.name, url }));
}

export async function sendAddressVerificationMail({ user, url }: AuthMailInput): Promise<void> {
  await queue("verify-address", user.email, verifyAddressMail({ name: user.name, url }));
}
