import type { BetterAuthOptions } from "better-auth";
import { CLIENT_ADDRESS_HEADER } from "./client-address";
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from "./password-rule";

// Requests allowed per client address in one window by better-auth's own limiter, for the
// endpoints it still guards (sign-up, reset, verification mail). Sign-in is limited by our hooks
// (sign-in-limit.ts), which count wrong passwords only.
export const AUTH_REQUEST_WINDOW_S = 60;
export const AUTH_REQUEST_MAX = 10;

export const authOptionsBase = {
  appName: "Trimrail",
  emailAndPassword: {
    enabled: true,
    minPasswordLength: PASSWORD_MIN_LENGTH,
    maxPasswordLength: PASSWORD_MAX_LENGTH,
    // A new address is confirmed before its first sign-in; with this better-auth also answers a
    // sign-up with a registered address as it answers a new one (no session, no error).
    requireEmailVerification: true,
    autoSignIn: false,
  },
  user: {
    additionalFields: {
      // Role and units are ours: never taken from a sign-up body; roles change only by the maker.
      role: { type: "string", required: false, defaultValue: "customer", input: false },
      unitSystem: { type: "string", required: false, defaultValue: "metric", input: false },
    },
  },
  advanced: {
    // Cookies are Secure whenever the app's public URL is https (behind a TLS proxy too).
    useSecureCookies: (process.env.BETTER_AUTH_URL ?? "").startsWith("https://"),
    // The address our server hook resolved (client-address-hook.ts), never a header a client set.
    ipAddress: { ipAddressHeaders: [CLIENT_ADDRESS_HEADER] },
  },
  rateLimit: {
    enabled: true,
    storage: "database",
    modelName: "rateLimit",
    window: 60,
    max: 300,
    customRules: {
      "/sign-in/email": false,
      "/sign-up/email": { window: AUTH_REQUEST_WINDOW_S, max: AUTH_REQUEST_MAX },
    },
  },
} satisfies Partial<BetterAuthOptions>;
