import Link from "next/link";
import { AuthForm } from "@/components/auth/auth-form";

export const metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: PageProps<"/sign-in">) {
  const { next } = await searchParams;
  return (
    <>
      <h1 className="mb-4 text-2xl">Sign in</h1>
      <AuthForm mode="sign-in" next={typeof next === "string" ? next : undefined} />
      <p className="mt-3 text-sm">
        <Link href="/forgot-password" className="text-accent underline">
          Forgot your password?
        </Link>
      </p>
      <p className="mt-4 text-sm text-muted">
        New here?{" "}
        <Link href="/sign-up" className="text-accent underline">
          Create an account
        </Link>
      </p>
    </>
  );
}
