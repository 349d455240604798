// The shape half of the password rule, shared by the forms and the server; the server adds the
// strength check (password-strength.ts), whose dictionary stays out of the browser's bundle.
export const PASSWORD_MIN_LENGTH = 10;
// better-auth's default upper bound; stated here so the forms say the same.
export const PASSWORD_MAX_LENGTH = 128;

/**
 * Length in characters (code points, so an emoji is one), without spaces at either end: a
 * password of eight spaces, or two letters padded with spaces, is not ten characters of secret.
 */
/** The rule in words, under every field that sets a password. */
export const PASSWORD_HINT = `At least ${PASSWORD_MIN_LENGTH} characters, and not an easily guessed one: a few unrelated words work well.`;

export const passwordLength = (password: string): number => [...password.trim()].length;

export interface PasswordProblem {
  /** The error code the server answers with; the forms tie every one of them to the password field. */
  code: (typeof PASSWORD_ERROR_CODES)[number];
  message: string;
}

export const PASSWORD_ERROR_CODES = ["PASSWORD_TOO_SHORT", "PASSWORD_TOO_LONG", "PASSWORD_TOO_WEAK", "INVALID_PASSWORD"] as const;

export const isPasswordErrorCode = (code: string | undefined): boolean => (PASSWORD_ERROR_CODES as readonly string[]).includes(code ?? "");

/** What is wrong with the password's shape, or null. */
export function passwordShapeProblem(password: string): PasswordProblem | null {
  if ([...password].length > PASSWORD_MAX_LENGTH)
    return { code: "PASSWORD_TOO_LONG", message: `Use at most ${PASSWORD_MAX_LENGTH} characters.` };
  if (passwordLength(password) < PASSWORD_MIN_LENGTH)
    return {
      code: "PASSWORD_TOO_SHORT",
      message: `Use at least ${PASSWORD_MIN_LENGTH} characters; spaces at the start or end do not count.`,
    };
  return null;
}
