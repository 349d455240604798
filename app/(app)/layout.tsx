import Link from "next/link";
import type { ReactNode } from "react";
import { AppNav } from "@/components/shell/app-nav";
import { navItemsFor } from "@/components/shell/nav-items";
import { SignOutButton } from "@/components/shell/sign-out-button";
import { Logo } from "@/components/ui/logo";
import { QueryProvider } from "@/components/providers/query-provider";
import { requirePageViewer } from "@/lib/auth/guard";

export default async function AppLayout({ children }: { children: ReactNode }) {
  const viewer = await requirePageViewer();
  return (
    <div className="min-h-screen">
      <header className="border-b border-hairline bg-paper print:hidden">
        <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-4 px-4 py-3">
          <Link href="/setups">
            <Logo size={24} />
          </Link>
          <AppNav items={navItemsFor(viewer.role)} />
          <div className="ml-auto flex items-center gap-3 text-sm">
            <span data-testid="viewer">
              {viewer.name}{" "}
              <span className="rounded bg-white px-1.5 py-0.5 text-xs text-muted" data-testid="viewer-role">
                {viewer.role}
              </span>
            </span>
            <SignOutButton />
          </div>
        </div>
      </header>
      <main id="main" tabIndex={-1} className="mx-auto max-w-7xl px-4 py-6 focus:outline-none">
        <QueryProvider>{children}</QueryProvider>
      </main>
    </div>
  );
}
