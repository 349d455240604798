import Link from "next/link";

export const WORKSHOP_TABS = [
  { href: "/workshop", key: "models", label: "Envelope models" },
  { href: "/workshop/units", key: "units", label: "Serial units" },
  { href: "/workshop/mounts", key: "mounts", label: "Mounts" },
  { href: "/workshop/adapters", key: "adapters", label: "Adapters" },
  { href: "/workshop/templates", key: "templates", label: "Payload templates" },
  { href: "/workshop/people", key: "people", label: "People" },
] as const;
export type WorkshopTab = (typeof WORKSHOP_TABS)[number]["key"];

interface WorkshopNavProps {
  current: WorkshopTab;
  title: string;
  intro?: string;
}

/** The Workshop's heading and its sections; the current one is marked for assistive technology too. */
export function WorkshopNav({ current, title, intro }: WorkshopNavProps) {
  return (
    <div className="space-y-3">
      <nav aria-label="Workshop" data-testid="workshop-nav">
        <ul className="flex flex-wrap gap-1 border-b border-hairline text-sm">
          {WORKSHOP_TABS.map((tab) => (
            <li key={tab.key}>
              <Link
                href={tab.href}
                aria-current={tab.key === current ? "page" : undefined}
                className={`-mb-px inline-block rounded-t border px-3 py-1.5 ${tab.key === current ? "border-hairline border-b-white bg-white font-medium text-ink" : "border-transparent text-accent-dark hover:underline"}`}
              >
                {tab.label}
              </Link>
            </li>
          ))}
        </ul>
      </nav>
      <div>
        <h1 className="text-2xl">{title}</h1>
        {intro && <p className="text-sm text-muted">{intro}</p>}
      </div>
    </div>
  );
}
