import Link from "next/link";
import { ForgotPasswordForm } from "@/components/auth/forgot-password-form";

export const metadata = { title: "Forgot your password?" };

export default function ForgotPasswordPage() {
  return (
    <>
      <h1 className="mb-2 text-2xl">Forgot your password?</h1>
      <p className="mb-4 text-sm text-muted">Give the e-mail address of your account and we send a link to choose a new one.</p>
      <ForgotPasswordForm />
      <p className="mt-4 text-sm text-muted">
        Remembered it?{" "}
        <Link href="/sign-in" className="text-accent underline">
          Sign in
        </Link>
      </p>
    </>
  );
}
