"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { authClient } from "@/lib/auth/client";
import { PASSWORD_MIN_LENGTH } from "@/lib/auth/password-rule";

const signInSchema = z.object({
  email: z.email("Enter an e-mail address."),
  password: z.string().min(PASSWORD_MIN_LENGTH, `At least ${PASSWORD_MIN_LENGTH} characters.`),
});
const signUpSchema = signInSchema.extend({
  name: z.string().trim().min(1, "Enter your name.").max(80, "At most 80 characters."),
});
type SignUpValues = z.infer<typeof signUpSchema>;

interface AuthFormProps {
  mode: "sign-in" | "sign-up";
  next?: string;
}

function safeNext(next: string | undefined): string {
  // Only same-site paths, so a crafted link cannot send people elsewhere after sign-in.
  return next && next.startsWith("/") && !next.startsWith("//") ? next : "/setups";
}

export function AuthForm({ mode, next }: AuthFormProps) {
  const router = useRouter();
  const [serverError, setServerError] = useState<string | null>(null);
  const schema = mode === "sign-up" ? signUpSchema : signInSchema;
  const {
    register,
    handleSubmit,
    formState: { errors, isSubmitting },
  } = useForm<SignUpValues>({ resolver: zodResolver(schema as typeof signUpSchema) });

  const onSubmit = handleSubmit(async (values) => {
    setServerError(null);
    const { error } =
      mode === "sign-up"
        ? await authClient.signUp.email({ name: values.name, email: values.email, password: values.password, callbackURL: "/setups" })
        : await authClient.signIn.email({ email: values.email, password: values.password });
    if (error) {
      setServerError(
        error.status === 429 ? "Too many attempts. Wait a minute and try again." : (error.message ?? "That did not work."),
      );
      return;
    }
    router.replace(safeNext(next));
    router.refresh();
  });

  const field = "mt-1 w-full rounded border border-hairline bg-white px-3 py-2";
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" data-testid={`${mode}-form`}>
      {mode === "sign-up" && (
        <label className="block text-sm">
          Name
          <input {...register("name")} autoComplete="name" className={field} />
          {errors.name && <span className="text-flag-stop" role="alert">{errors.name.message}</span>}
        </label>
      )}
      <label className="block text-sm">
        E-mail
        <input {...register("email")} type="email" autoComplete="email" className={field} />
        {errors.email && <span className="text-flag-stop" role="alert">{errors.email.message}</span>}
      </label>
      <label className="block text-sm">
        Password
        <input
          {...register("password")}
          type="password"
          autoComplete={mode === "sign-up" ? "new-password" : "current-password"}
          className={field}
        />
        {errors.password && <span className="text-flag-stop" role="alert">{errors.password.message}</span>}
      </label>
      {serverError && (
        <p className="text-sm text-flag-stop" role="alert" data-testid="auth-error">{serverError}</p>
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
