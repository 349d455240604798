"use client";
import type { UnitSystem } from "@/lib/domain";
import type { Flag } from "@/lib/balance";
import { flagMessage } from "@/lib/flag-messages";
import { FlagIcon } from "@/components/ui/flag-badge";

const ORDER = { stop: 0, caution: 1, ok: 2 } as const;

/** Every flag with its icon, its word and its plain message in the reader's units; the worst first. */
export function FlagList({
  flags,
  unitSystem = "metric",
  testId = "flag-list",
}: {
  flags: readonly Flag[];
  unitSystem?: UnitSystem;
  testId?: string;
}) {
  const sorted = [...flags].sort((a, b) => ORDER[a.level] - ORDER[b.level]);
  return (
    <ul className="space-y-1.5" data-testid={testId}>
      {sorted.map((flag, i) => (
        <li
          key={`${flag.code}-${flag.payloads?.map((p) => p.index).join(".") ?? ""}-${i}`}
          className="flex gap-2 text-sm"
          data-flag-code={flag.code}
          data-flag-level={flag.level}
        >
          <span className="mt-0.5 shrink-0">
            <FlagIcon level={flag.level} />
          </span>
          <span>
            <span className="font-medium">{flag.level}</span> · {flagMessage(flag, unitSystem)}
          </span>
        </li>
      ))}
    </ul>
  );
}
