import type { ReactNode } from "react";

interface SectionProps {
  title: string;
  children: ReactNode;
  defaultOpen?: boolean;
  testId?: string;
}

/** A collapsible group of inputs; native <details> keeps it keyboard-accessible with no script. */
export function Section({ title, children, defaultOpen = true, testId }: SectionProps) {
  return (
    <details open={defaultOpen} className="panel group" data-testid={testId}>
      <summary className="cursor-pointer select-none px-4 py-2 font-display font-bold">{title}</summary>
      <div className="border-t border-hairline px-4 py-3">{children}</div>
    </details>
  );
}
