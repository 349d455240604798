"use client";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { PASSWORD_HINT, isPasswordErrorCode, passwordShapeProblem } from "@/lib/auth/password-rule";
import { signInWithEmail, signUpWithEmail, type AuthFailure } from "./auth-requests";

// Checked by hand rather than with a form library and a schema library: three fields do not earn
// their ~50 KB on the first page a visitor sees. better-auth checks the same again on the server.
const EMAIL_PATTERN = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;
const NAME_MAX_CHARS = 80;

type Field = "name" | "email" | "password";
type FieldErrors = Partial<Record<Field, string>>;

interface AuthFormProps {
  mode: "sign-in" | "sign-up";
  next?: string;
}

function safeNext(next: string | undefined): string {
  // Only same-site paths, so a crafted link cannot send people elsewhere after sign-in.
  return next && next.startsWith("/") && !next.startsWith("//") ? next : "/setups";
}

function checkFields(mode: AuthFormProps["mode"], values: Record<Field, string>): FieldErrors {
  const errors: FieldErrors = {};
  if (mode === "sign-up") {
    if (values.name.length === 0) errors.name = "Enter your name.";
    else if (values.name.length > NAME_MAX_CHARS) errors.name = `At most ${NAME_MAX_CHARS} characters.`;
  }
  if (!EMAIL_PATTERN.test(values.email)) errors.email = "Enter an e-mail address.";
  // Sign-in takes any password an account may still have from before the current rule.
  if (mode === "sign-in" && values.password.length === 0) errors.password = "Enter your password.";
  const shape = mode === "sign-up" ? passwordShapeProblem(values.password) : null;
  if (shape) errors.password = shape.message;
  return errors;
}

/** Where the server's refusal belongs: next to the field it is about, or above the button. */
function placeFailure(failure: AuthFailure): { field?: Field; message: string } {
  if (isPasswordErrorCode(failure.code)) return { field: "password", message: failure.message };
  if (failure.code === "INVALID_EMAIL") return { field: "email", message: "Enter an e-mail address." };
  if (failure.code === "EMAIL_NOT_VERIFIED")
    return { message: "Confirm your e-mail address first: we have sent a new link to it. Follow it to sign in." };
  if (failure.status === 429)
    return { message: failure.code === "TOO_MANY_SIGN_IN_ATTEMPTS" ? failure.message : "Too many attempts. Wait a minute and try again." };
  return { message: failure.message };
}

export function AuthForm({ mode, next }: AuthFormProps) {
  const router = useRouter();
  const [errors, setErrors] = useState<FieldErrors>({});
  const [serverError, setServerError] = useState<string | null>(null);
  const [isSubmitting, setSubmitting] = useState(false);
  const [sentTo, setSentTo] = useState<string | null>(null);

  const onSubmit = async (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const text = (key: Field) => String(form.get(key) ?? "");
    const values = { name: text("name").trim(), email: text("email").trim(), password: text("password") };
    const found = checkFields(mode, values);
    setErrors(found);
    setServerError(null);
    if (Object.keys(found).length > 0) return;

    setSubmitting(true);
    const failure =
      mode === "sign-up"
        ? await signUpWithEmail({ ...values, callbackURL: "/setups" })
        : await signInWithEmail({ email: values.email, password: values.password });
    if (failure) {
      setSubmitting(false);
      const placed = placeFailure(failure);
      if (placed.field) setErrors({ [placed.field]: placed.message });
      else setServerError(placed.message);
      return;
    }
    if (mode === "sign-up") {
      setSentTo(values.email);
      return;
    }
    router.replace(safeNext(next));
    router.refresh();
  };

  if (sentTo) {
    // The same words whether or not the address already had an account: the server says no more.
    return (
      <p className="text-sm" role="status" data-testid="sign-up-sent">
        Check your mail to finish signing up. We have sent a message to <strong>{sentTo}</strong>; follow its link to confirm the address
        and sign in. Nothing arrived after a few minutes? Check the address and the spam folder, and try again.
      </p>
    );
  }

  const field = "mt-1 w-full rounded border border-hairline bg-white px-3 py-2";
  const fieldError = (key: Field) =>
    errors[key] ? (
      <span className="text-flag-stop" role="alert" id={`${mode}-${key}-error`}>
        {errors[key]}
      </span>
    ) : null;
  // On sign-up the password field also points at the rule, so it is read out before typing.
  const hintId = mode === "sign-up" ? `${mode}-password-hint` : null;
  const described = (key: Field) => {
    const ids = [errors[key] ? `${mode}-${key}-error` : null, key === "password" ? hintId : null].filter(Boolean).join(" ");
    return { ...(errors[key] ? { "aria-invalid": true } : {}), ...(ids ? { "aria-describedby": ids } : {}) };
  };

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" data-testid={`${mode}-form`}>
      {mode === "sign-up" && (
        <div className="text-sm">
          <label className="block">
            Name
            <input name="name" autoComplete="name" className={field} {...described("name")} />
          </label>
          {fieldError("name")}
        </div>
      )}
      <div className="text-sm">
        <label className="block">
          E-mail
          <input name="email" type="email" autoComplete="email" className={field} {...described("email")} />
        </label>
        {fieldError("email")}
      </div>
      {/* The hint and the error sit outside the label: they describe the field, they do not name it. */}
      <div className="text-sm">
        <label className="block">
          Password
          <input
            name="password"
            type="password"
            autoComplete={mode === "sign-up" ? "new-password" : "current-password"}
            className={field}
            {...described("password")}
          />
        </label>
        {hintId && (
          <span className="block text-muted" id={hintId}>
            {PASSWORD_HINT}
          </span>
        )}
        {fieldError("password")}
      </div>
      {serverError && (
        <p className="text-sm text-flag-stop" role="alert" data-testid="auth-error">
          {serverError}
        </p>
      )}
      <button
        type="submit"
        disabled={isSubmitting}
        className="w-full rounded bg-accent px-4 py-2 font-medium text-white hover:bg-accent-dark disabled:opacity-60"
      >
        {mode === "sign-up" ? "Create account" : "Sign in"}
      </button>
    </form>
  );
}
