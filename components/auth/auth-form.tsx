"use client";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { PASSWORD_MIN_LENGTH } from "@/lib/auth/password-rule";
import { signInWithEmail, signUpWithEmail } from "./auth-requests";

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
  if (values.password.length < PASSWORD_MIN_LENGTH) errors.password = `At least ${PASSWORD_MIN_LENGTH} characters.`;
  return errors;
}

export function AuthForm({ mode, next }: AuthFormProps) {
  const router = useRouter();
  const [errors, setErrors] = useState<FieldErrors>({});
  const [serverError, setServerError] = useState<string | null>(null);
  const [isSubmitting, setSubmitting] = useState(false);

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
      setServerError(failure.status === 429 ? "Too many attempts. Wait a minute and try again." : failure.message);
      return;
    }
    router.replace(safeNext(next));
    router.refresh();
  };

  const field = "mt-1 w-full rounded border border-hairline bg-white px-3 py-2";
  const fieldError = (key: Field) =>
    errors[key] ? (
      <span className="text-flag-stop" role="alert" id={`${mode}-${key}-error`}>
        {errors[key]}
      </span>
    ) : null;
  const described = (key: Field) => (errors[key] ? { "aria-invalid": true, "aria-describedby": `${mode}-${key}-error` } : {});

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" data-testid={`${mode}-form`}>
      {mode === "sign-up" && (
        <label className="block text-sm">
          Name
          <input name="name" autoComplete="name" className={field} {...described("name")} />
          {fieldError("name")}
        </label>
      )}
      <label className="block text-sm">
        E-mail
        <input name="email" type="email" autoComplete="email" className={field} {...described("email")} />
        {fieldError("email")}
      </label>
      <label className="block text-sm">
        Password
        <input
          name="password"
          type="password"
          autoComplete={mode === "sign-up" ? "new-password" : "current-password"}
          className={field}
          {...described("password")}
        />
        {fieldError("password")}
      </label>
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
