"use client";
import { useState, useTransition } from "react";
import { changeRoleAction } from "@/app/(app)/workshop/actions";
import { ROLES, type Role } from "@/lib/domain";

interface RoleSelectProps {
  userId: string;
  role: Role;
  disabled?: boolean;
}

export function RoleSelect({ userId, role, disabled = false }: RoleSelectProps) {
  const [value, setValue] = useState<Role>(role);
  const [message, setMessage] = useState<string | null>(null);
  const [pending, startTransition] = useTransition();
  return (
    <span className="inline-flex items-center gap-2">
      <select
        aria-label="Role"
        value={value}
        disabled={disabled || pending}
        className="rounded border border-hairline bg-white px-2 py-1"
        onChange={(event) => {
          const next = event.target.value as Role;
          const previous = value;
          setValue(next);
          startTransition(async () => {
            const result = await changeRoleAction({ userId, role: next });
            if (result.ok) setMessage("saved");
            else {
              setValue(previous);
              setMessage(result.error.message);
            }
          });
        }}
      >
        {ROLES.map((r) => (
          <option key={r} value={r}>{r}</option>
        ))}
      </select>
      {message && <span className="text-xs text-muted" role="status">{message}</span>}
    </span>
  );
}
