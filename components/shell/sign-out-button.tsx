"use client";
import { useRouter } from "next/navigation";
import { signOutSession } from "@/components/auth/auth-requests";

export function SignOutButton() {
  const router = useRouter();
  return (
    <button
      type="button"
      className="text-sm text-muted underline-offset-2 hover:underline"
      onClick={async () => {
        await signOutSession();
        router.replace("/sign-in");
        router.refresh();
      }}
    >
      Sign out
    </button>
  );
}
