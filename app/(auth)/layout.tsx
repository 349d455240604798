import Link from "next/link";
import type { ReactNode } from "react";
import { Logo } from "@/components/ui/logo";

export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <main id="main" tabIndex={-1} className="mx-auto flex min-h-screen max-w-sm flex-col justify-center px-6 py-12 focus:outline-none">
      <Link href="/" className="mb-8 self-start">
        <Logo />
      </Link>
      <div className="panel p-6">{children}</div>
    </main>
  );
}
