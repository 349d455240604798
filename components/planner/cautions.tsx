import type { BalanceResult } from "@/lib/balance";
import { cautionsFor } from "@/lib/cautions";

interface CautionsProps {
  hasAntenna: boolean;
  result: BalanceResult;
}

/** The usual cautions (lib/cautions.ts), with the ones this setup triggers said first. */
export function Cautions({ hasAntenna, result }: CautionsProps) {
  const items = cautionsFor({ hasAntenna, freeLiftKg: result.freeLiftKg });
  return (
    <aside aria-label="Cautions" className="border-l-4 border-flag-caution bg-white p-3 text-xs" data-testid="cautions">
      <p className="font-medium">Cautions</p>
      <ul className="mt-1 list-disc space-y-1 pl-4 text-muted">
        {items.map((text) => (
          <li key={text}>{text}</li>
        ))}
      </ul>
    </aside>
  );
}
