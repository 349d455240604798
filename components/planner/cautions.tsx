import type { BalanceResult } from "@/lib/balance";

interface CautionsProps {
  hasAntenna: boolean;
  result: BalanceResult;
}

/**
 * The usual cautions, with the ones this setup triggers said first. The moored-balloon size and
 * tether-height rules are the engine's own flags (`moored-balloon-rules`, `tether-height`) and show
 * in the flag list; this box carries what applies to every flight.
 */
export function Cautions({ hasAntenna, result }: CautionsProps) {
  const items: string[] = [];
  if (hasAntenna) items.push("Antennas and conductive tethers can carry current from power lines or static: keep far from overhead lines and never fly near thunderstorms.");
  if (result.freeLiftKg <= 0) items.push("Without free lift it will not fly: do not release it to find out.");
  items.push("Helium cylinders are high-pressure vessels: secure them upright and use a proper regulator.");
  items.push("Never fly near power lines, roads or airports, or in thunderstorms; follow local aviation rules (for example 14 CFR Part 101 in the US) and licensed practice.");
  items.push("These are planning estimates: make a test flight on a safety line before trusting a payload to it.");
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
