import type { ReactNode } from "react";

interface WorkshopTableProps {
  testId: string;
  children: ReactNode;
}

/** A Workshop list's table; on a narrow screen it scrolls sideways inside its own box, not the page. */
export function WorkshopTable({ testId, children }: WorkshopTableProps) {
  return (
    <div className="overflow-x-auto">
      <table className="panel w-full border-separate border-spacing-0 text-sm" data-testid={testId}>
        {children}
      </table>
    </div>
  );
}
