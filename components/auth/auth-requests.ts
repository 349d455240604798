/**
 * better-auth's e-mail and sign-out endpoints, called with fetch. Its client library would add
 * about 12 KB of compressed JavaScript to every page that signs in or out, for three POSTs.
 */
export interface AuthFailure {
  /** HTTP status; 0 when the server could not be reached. */
  status: number;
  message: string;
  /** better-auth's error code, e.g. INVALID_TOKEN. */
  code?: string;
}

async function postToAuth(path: string, body: Record<string, string>): Promise<AuthFailure | null> {
  try {
    const response = await fetch(`/api/auth/${path}`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify(body),
    });
    if (response.ok) return null;
    const data = (await response.json().catch(() => ({}))) as { message?: unknown; code?: unknown };
    return {
      status: response.status,
      message: typeof data.message === "string" ? data.message : `The server answered ${response.status}.`,
      ...(typeof data.code === "string" ? { code: data.code } : {}),
    };
  } catch {
    return { status: 0, message: "The server could not be reached." };
  }
}

export const signInWithEmail = (input: { email: string; password: string }) => postToAuth("sign-in/email", input);

/** `callbackURL`: where the address-verification link lands once followed. */
export const signUpWithEmail = (input: { name: string; email: string; password: string; callbackURL: string }) =>
  postToAuth("sign-up/email", input);

export const signOutSession = () => postToAuth("sign-out", {});

/** Mails a reset link if the address has an account; the answer is the same either way. */
export const requestPasswordReset = (input: { email: string; redirectTo: string }) => postToAuth("request-password-reset", input);

export const resetPassword = (input: { newPassword: string; token: string }) => postToAuth("reset-password", input);
