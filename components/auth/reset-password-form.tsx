"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { resetPassword } from "./auth-requests";
import { PASSWORD_HINT, isPasswordErrorCode, passwordShapeProblem } from "@/lib/auth/password-rule";

const schema = z
  .object({
    password: z.string().superRefine((value, check) => {
      const problem = passwordShapeProblem(value);
      if (problem) check.addIssue({ code: "custom", message: problem.message });
    }),
    confirm: z.string(),
  })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords differ." });
type Values = z.infer<typeof schema>;

interface ResetPasswordFormProps {
  token: string;
}

export function ResetPasswordForm({ token }: ResetPasswordFormProps) {
  const [outcome, setOutcome] = useState<"changed" | "expired" | null>(null);
  const [serverError, setServerError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<Values>({ resolver: zodResolver(schema) });

  const onSubmit = handleSubmit(async ({ password }) => {
    setServerError(null);
    const error = await resetPassword({ newPassword: password, token });
    if (!error) return setOutcome("changed");
    if (error.code === "INVALID_TOKEN") return setOutcome("expired");
    // The server's strength check (a common password, say) belongs next to the field it is about.
    if (isPasswordErrorCode(error.code)) return setError("password", { message: error.message }, { shouldFocus: true });
    setServerError(error.status === 429 ? "Too many attempts. Wait a minute and try again." : error.message);
  });

  if (outcome === "changed") {
    return (
      <p className="text-sm" role="status" data-testid="reset-password-done">
        Your password is changed.{" "}
        <Link href="/sign-in" className="text-accent underline">
          Sign in with it
        </Link>
        .
      </p>
    );
  }
  if (outcome === "expired") return <ExpiredLink />;

  // Each field points at its error (and the first at the rule), so both are read out with it.
  const passwordInput = (name: keyof Values, label: string, hintId?: string) => {
    const errorId = `reset-${name}-error`;
    const described = [hintId, errors[name] ? errorId : undefined].filter(Boolean).join(" ");
    // The hint and the error sit outside the label: they describe the field, they do not name it.
    return (
      <>
        <label className="block">
          {label}
          <input
            {...register(name)}
            type="password"
            autoComplete="new-password"
            className="mt-1 w-full rounded border border-hairline bg-white px-3 py-2"
            aria-invalid={errors[name] ? true : undefined}
            aria-describedby={described || undefined}
          />
        </label>
        {hintId && (
          <span className="block text-muted" id={hintId}>
            {PASSWORD_HINT}
          </span>
        )}
        {errors[name] && (
          <span className="text-flag-stop" role="alert" id={errorId}>
            {errors[name].message}
          </span>
        )}
      </>
    );
  };
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" data-testid="reset-password-form">
      <div className="text-sm">{passwordInput("password", "New password", "reset-password-hint")}</div>
      <div className="text-sm">{passwordInput("confirm", "The same again")}</div>
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
        Set the new password
      </button>
    </form>
  );
}

export function ExpiredLink() {
  return (
    <p className="text-sm" role="alert" data-testid="reset-password-expired">
      This link has expired or was already used.{" "}
      <Link href="/forgot-password" className="text-accent underline">
        Ask for a new one
      </Link>
      .
    </p>
  );
}
