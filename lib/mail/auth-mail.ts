import "server-only";
import { enqueueMailNow } from "@/db/queries/mail";
import { kickMailDelivery } from "./deliver";
import { appUrl } from "@/lib/server/app-url";
import { passwordResetMail, signUpAttemptMail, verifyAddressMail, type MailContent } from "./templates";

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

/** A sign-up with an address that has an account: tell its holder, and give the same answer. */
export async function sendSignUpAttemptMail({ user }: { user: { email: string; name: string } }): Promise<void> {
  await queue(
    "sign-up-attempt",
    user.email,
    signUpAttemptMail({ name: user.name, signInUrl: appUrl("/sign-in"), resetUrl: appUrl("/forgot-password") }),
  );
}
