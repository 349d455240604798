// One password rule for sign-up, reset and better-auth's own check (lib/auth/options.ts).
export const PASSWORD_MIN_LENGTH = 8;
// better-auth's default upper bound; stated here so the forms say the same.
export const PASSWORD_MAX_LENGTH = 128;
