import "server-only";
import { betterAuth } from "better-auth";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { nextCookies } from "better-auth/next-js";
import { getDb } from "@/db";
import * as schema from "@/db/schema";
import { sendAddressVerificationMail, sendPasswordResetMail } from "@/lib/mail/auth-mail";
import { authOptionsBase } from "./options";

export const auth = betterAuth({
  ...authOptionsBase,
  // Both mails go through the outbox (lib/mail): the request returns without waiting for SMTP.
  // Verification is sent on sign-up but not required to sign in (the demo accounts are verified).
  emailAndPassword: { ...authOptionsBase.emailAndPassword, sendResetPassword: sendPasswordResetMail },
  emailVerification: { sendOnSignUp: true, autoSignInAfterVerification: true, sendVerificationEmail: sendAddressVerificationMail },
  database: drizzleAdapter(getDb(), {
    provider: "sqlite",
    schema: {
      user: schema.user,
      session: schema.session,
      account: schema.account,
      verification: schema.verification,
      rateLimit: schema.rateLimit,
    },
  }),
  // nextCookies must stay last: it lets server actions set the session cookie.
  plugins: [nextCookies()],
});
