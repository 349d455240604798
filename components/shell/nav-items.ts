import type { Role } from "@/lib/domain";

export interface NavItem {
  href: string;
  label: string;
  roles: readonly Role[];
}

// The single list the shell draws from; each page still checks the role on the server.
export const NAV_ITEMS: readonly NavItem[] = [
  { href: "/setups", label: "Setups", roles: ["customer", "support", "maker"] },
  { href: "/review", label: "Review desk", roles: ["support", "maker"] },
  { href: "/workshop", label: "Workshop", roles: ["maker"] },
  { href: "/insight", label: "Insight", roles: ["support", "maker"] },
];

export function navItemsFor(role: Role): NavItem[] {
  return NAV_ITEMS.filter((item) => item.roles.includes(role));
}
