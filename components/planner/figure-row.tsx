import type { ReactNode } from "react";

interface FigureRowProps {
  label: string;
  children: ReactNode;
  testId?: string;
}

export function FigureRow({ label, children, testId }: FigureRowProps) {
  return (
    <div className="flex items-baseline justify-between gap-3 py-0.5 text-sm">
      <dt className="text-muted">{label}</dt>
      <dd className="figure text-right" data-testid={testId}>
        {children}
      </dd>
    </div>
  );
}
