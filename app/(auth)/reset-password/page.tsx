import { ExpiredLink, ResetPasswordForm } from "@/components/auth/reset-password-form";

export const metadata = { title: "Choose a new password" };

// The link in the reset mail passes through better-auth, which checks the token and sends the
// person here with `?token=…`, or with `?error=INVALID_TOKEN` when it has expired or was used.
export default async function ResetPasswordPage({ searchParams }: PageProps<"/reset-password">) {
  const { token, error } = await searchParams;
  const usable = typeof token === "string" && token.length > 0 && error === undefined;
  return (
    <>
      <h1 className="mb-4 text-2xl">Choose a new password</h1>
      {usable ? <ResetPasswordForm token={token} /> : <ExpiredLink />}
    </>
  );
}
