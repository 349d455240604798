"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { requestPasswordReset } from "./auth-requests";

const schema = z.object({ email: z.email("Enter an e-mail address.") });
type Values = z.infer<typeof schema>;

export function ForgotPasswordForm() {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [serverError, setServerError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    formState: { errors, isSubmitting },
  } = useForm<Values>({ resolver: zodResolver(schema) });

  const onSubmit = handleSubmit(async ({ email }) => {
    setServerError(null);
    // The server answers the same whether or not the address has an account; so do we.
    const error = await requestPasswordReset({ email, redirectTo: "/reset-password" });
    if (error) {
      setServerError(
        error.status === 429 ? "Too many requests. Wait a minute and try again." : "That did not work. Try again in a moment.",
      );
      return;
    }
    setSentTo(email);
  });

  if (sentTo) {
    return (
      <p className="text-sm" role="status" data-testid="forgot-password-sent">
        If an account uses <strong>{sentTo}</strong>, a link to choose a new password is on its way there. It works for one hour. Nothing
        arrived? Check the address and ask again.
      </p>
    );
  }

  const field = "mt-1 w-full rounded border border-hairline bg-white px-3 py-2";
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" data-testid="forgot-password-form">
      <label className="block text-sm">
        E-mail
        <input {...register("email")} type="email" autoComplete="email" className={field} />
        {errors.email && (
          <span className="text-flag-stop" role="alert">
            {errors.email.message}
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
        Send me a link
      </button>
    </form>
  );
}
