"use client";
import { useMutation } from "@tanstack/react-query";
import { useState } from "react";
import { changeRoleRequest } from "@/lib/client/api";
import { ROLES, type Role } from "@/lib/domain";

interface RoleSelectProps {
  userId: string;
  role: Role;
  disabled?: boolean;
}

export function RoleSelect({ userId, role, disabled = false }: RoleSelectProps) {
  const [value, setValue] = useState<Role>(role);
  const change = useMutation({
    mutationFn: ({ next }: { next: Role; previous: Role }) => changeRoleRequest(userId, next),
    onError: (_error, { previous }) => setValue(previous),
  });
  const message = change.isSuccess ? "saved" : (change.error?.message ?? null);
  return (
    <span className="inline-flex items-center gap-2">
      <select
        aria-label="Role"
        value={value}
        disabled={disabled || change.isPending}
        className="rounded border border-hairline bg-white px-2 py-1"
        onChange={(event) => {
          const next = event.target.value as Role;
          change.mutate({ next, previous: value });
          setValue(next);
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
