import type { BetterAuthOptions } from "better-auth";
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from "./password-rule";

// Sign-in attempts allowed per client address in one window (better-auth counts by IP).
export const SIGN_IN_WINDOW_S = 60;
export const SIGN_IN_MAX_ATTEMPTS = Number(process.env.TRIMRAIL_SIGN_IN_MAX ?? 10);

export const authOptionsBase = {
  appName: "Trimrail",
  emailAndPassword: { enabled: true, minPasswordLength: PASSWORD_MIN_LENGTH, maxPasswordLength: PASSWORD_MAX_LENGTH, autoSignIn: true },
  user: {
    additionalFields: {
      // Role and units are ours: never taken from a sign-up body; roles change only by the maker.
      role: { type: "string", required: false, defaultValue: "customer", input: false },
      unitSystem: { type: "string", required: false, defaultValue: "metric", input: false },
    },
  },
  // Cookies are Secure whenever the app's public URL is https (behind a TLS proxy too).
  advanced: { useSecureCookies: (process.env.BETTER_AUTH_URL ?? "").startsWith("https://") },
  rateLimit: {
    enabled: true,
    storage: "database",
    modelName: "rateLimit",
    window: 60,
    max: 300,
    customRules: {
      "/sign-in/email": { window: SIGN_IN_WINDOW_S, max: SIGN_IN_MAX_ATTEMPTS },
      "/sign-up/email": { window: SIGN_IN_WINDOW_S, max: SIGN_IN_MAX_ATTEMPTS },
    },
  },
} satisfies Partial<BetterAuthOptions>;
