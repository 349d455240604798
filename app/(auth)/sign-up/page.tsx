import Link from "next/link";
import { AuthForm } from "@/components/auth/auth-form";

export const metadata = { title: "Create an account" };

export default function SignUpPage() {
  return (
    <>
      <h1 className="mb-4 text-2xl">Create an account</h1>
      <AuthForm mode="sign-up" />
      <p className="mt-4 text-sm text-muted">
        Already have one?{" "}
        <Link href="/sign-in" className="text-accent underline">
          Sign in
        </Link>
      </p>
    </>
  );
}
