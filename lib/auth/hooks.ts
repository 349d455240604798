import "server-only";
import { APIError, createAuthMiddleware, isAPIError } from "better-auth/api";
import { clientAddressOf } from "./client-address-hook";
import { passwordProblem } from "./password-strength";
import { beginSignInAttempt, endSignInAttempt, tooManyAttemptsMessage, type SignInAttempt } from "./sign-in-limit";

// better-auth's before/after hooks: the sign-in limit, the password rule, and one answer to every
// sign-up. better-auth's own limiter counts every request, successes too, so sign-in is ours.

/** The one answer to a sign-up, whether the address was new or already had an account. */
export const SIGN_UP_ANSWER = {
  status: "check-your-mail",
  message: "Check your mail to finish signing up: we have sent a message to that address.",
} as const;

/** Where each endpoint that sets a password carries it. */
const PASSWORD_FIELD: Record<string, string> = {
  "/sign-up/email": "password",
  "/reset-password": "newPassword",
  "/change-password": "newPassword",
};

// Before and after hooks of one request see the same Request object; the attempt waits here.
const attempts = new WeakMap<Request, SignInAttempt>();

const text = (value: unknown): string | null => (typeof value === "string" ? value : null);

export const beforeAuthHook = createAuthMiddleware(async (ctx) => {
  const body = (ctx.body ?? {}) as Record<string, unknown>;
  const field = PASSWORD_FIELD[ctx.path];
  const password = field ? text(body[field]) : null;
  if (password !== null) {
    const personal = ctx.path === "/sign-up/email" ? [text(body.name), text(body.email)].filter((v): v is string => !!v) : [];
    const problem = passwordProblem(password, personal);
    if (problem) throw new APIError("BAD_REQUEST", problem);
  }

  if (ctx.path === "/sign-in/email" && ctx.request) {
    const verdict = await beginSignInAttempt({ address: clientAddressOf(ctx.request.headers), email: text(body.email) });
    if (!verdict.allowed) {
      throw new APIError(
        "TOO_MANY_REQUESTS",
        { code: "TOO_MANY_SIGN_IN_ATTEMPTS", message: tooManyAttemptsMessage(verdict.retryAfterS) },
        { "Retry-After": String(verdict.retryAfterS) },
      );
    }
    attempts.set(ctx.request, verdict.attempt);
  }
});

export const afterAuthHook = createAuthMiddleware(async (ctx) => {
  const returned = ctx.context.returned;
  if (ctx.path === "/sign-in/email" && ctx.request) {
    const attempt = attempts.get(ctx.request);
    if (attempt) {
      attempts.delete(ctx.request);
      const status = isAPIError(returned) ? returned.statusCode : 200;
      await endSignInAttempt(attempt, status === 401 ? "wrong-password" : status === 200 ? "signed-in" : "other");
    }
  }
  // A registered address gets better-auth's stand-in user, a new one the real one (and different
  // ids either way): the answer replaces both with the same words, so it tells nothing.
  if (ctx.path === "/sign-up/email" && !isAPIError(returned)) return ctx.json(SIGN_UP_ANSWER);
});
