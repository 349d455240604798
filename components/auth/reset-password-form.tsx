"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { resetPassword } from "./auth-requests";
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from "@/lib/auth/password-rule";

const schema = z
  .object({
    password: z
      .string()
      .min(PASSWORD_MIN_LENGTH, `At least ${PASSWORD_MIN_LENGTH} characters.`)
      .max(PASSWORD_MAX_LENGTH, `At most ${PASSWORD_MAX_LENGTH} characters.`),
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
    formState: { errors, isSubmitting },
  } = useForm<Values>({ resolver: zodResolver(schema) });

  const onSubmit = handleSubmit(async ({ password }) => {
    setServerError(null);
    const error = await resetPassword({ newPassword: password, token });
    if (!error) return setOutcome("changed");
    if (error.code === "INVALID_TOKEN") return setOutcome("expired");
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

  const field = "mt-1 w-full rounded border border-hairline bg-white px-3 py-2";
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" data-testid="reset-password-form">
      <label className="block text-sm">
        New password
        <input {...register("password")} type="password" autoComplete="new-password" className={field} />
        {errors.password && (
          <span className="text-flag-stop" role="alert">
            {errors.password.message}
          </span>
        )}
      </label>
      <label className="block text-sm">
        The same again
        <input {...register("confirm")} type="password" autoComplete="new-password" className={field} />
        {errors.confirm && (
          <span className="text-flag-stop" role="alert">
            {errors.confirm.message}
          </span>
        )}
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
