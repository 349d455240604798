"use client";
import Link from "next/link";
import { useAppPathname } from "@/components/ui/app-location";
import type { NavItem } from "./nav-items";

export function AppNav({ items }: { items: NavItem[] }) {
  const pathname = useAppPathname();
  return (
    <nav aria-label="Main" data-testid="main-nav" className="flex gap-1">
      {items.map((item) => {
        const current = pathname === item.href || pathname.startsWith(`${item.href}/`);
        return (
          <Link
            key={item.href}
            href={item.href}
            aria-current={current ? "page" : undefined}
            className={`rounded px-3 py-1.5 text-sm ${current ? "bg-accent text-white" : "hover:bg-white"}`}
          >
            {item.label}
          </Link>
        );
      })}
    </nav>
  );
}
