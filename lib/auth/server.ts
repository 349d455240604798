import "server-only";
import { betterAuth } from "better-auth";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { nextCookies } from "better-auth/next-js";
import { getDb } from "@/db";
import * as schema from "@/db/schema";
import { sendAddressVerificationMail, sendPasswordResetMail, sendSignUpAttemptMail } from "@/lib/mail/auth-mail";
import { afterAuthHook, beforeAuthHook } from "./hooks";
import { authOptionsBase } from "./options";
import { forgetAccountFailures } from "./sign-in-limit";

export const auth = betterAuth({
  ...authOptionsBase,
  // Every mail goes through the outbox (lib/mail): the request returns without waiting for SMTP.
  emailAndPassword: {
    ...authOptionsBase.emailAndPassword,
    sendResetPassword: sendPasswordResetMail,
    onExistingUserSignUp: sendSignUpAttemptMail,
    onPasswordReset: ({ user }) => forgetAccountFailures(user.email),
  },
  // Following the link signs the new account in; signing in before that sends a fresh link.
  emailVerification: {
    sendOnSignUp: true,
    sendOnSignIn: true,
    autoSignInAfterVerification: true,
    sendVerificationEmail: sendAddressVerificationMail,
  },
  hooks: { before: beforeAuthHook, after: afterAuthHook },
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
