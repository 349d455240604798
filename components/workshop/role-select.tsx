"use client";
import { useMutation } from "@tanstack/react-query";
import { useId, useState } from "react";
import { changeRoleRequest } from "@/lib/client/api";
import { ROLES, type Role } from "@/lib/domain";

interface RoleSelectProps {
  userId: string;
  name: string;
  role: Role;
  disabled?: boolean;
}

/**
 * A role change is an explicit act: choosing in the menu (by mouse or by arrow keys) only proposes
 * a role; nothing is sent until the maker presses "Change role…" and then confirms, on a question
 * that names the person and both roles.
 */
export function RoleSelect({ userId, name, role, disabled = false }: RoleSelectProps) {
  const id = useId();
  const [current, setCurrent] = useState<Role>(role);
  const [proposed, setProposed] = useState<Role>(role);
  const [confirming, setConfirming] = useState(false);
  const change = useMutation({
    mutationFn: (next: Role) => changeRoleRequest(userId, next),
    onSuccess: ({ role: saved }) => {
      setCurrent(saved);
      setProposed(saved);
      setConfirming(false);
    },
  });
  const message = change.isSuccess ? `${name} is now ${current}.` : (change.error?.message ?? null);
  return (
    <span className="inline-flex flex-wrap items-center gap-2" data-testid="role-select" data-role={current}>
      <label htmlFor={id} className="sr-only">
        Role of {name}
      </label>
      <select
        id={id}
        value={proposed}
        disabled={disabled || change.isPending}
        className="rounded border border-hairline bg-white px-2 py-1"
        onChange={(event) => {
          setProposed(event.target.value as Role);
          setConfirming(false);
        }}
        data-testid="role-choice"
      >
        {ROLES.map((r) => (
          <option key={r} value={r}>
            {r}
            {r === current ? " (now)" : ""}
          </option>
        ))}
      </select>
      {proposed !== current && !confirming && (
        <button
          type="button"
          onClick={() => setConfirming(true)}
          className="rounded border border-accent bg-white px-2 py-1 text-sm text-accent-dark"
          data-testid="role-change"
        >
          Change {name}&apos;s role…
        </button>
      )}
      {confirming && (
        <span
          role="group"
          aria-label={`Confirm the role change of ${name}`}
          className="inline-flex flex-wrap items-center gap-2 rounded border border-flag-caution bg-paper px-2 py-1 text-sm"
        >
          <span>
            Make {name} {proposed} instead of {current}?
          </span>
          <button
            type="button"
            onClick={() => change.mutate(proposed)}
            disabled={change.isPending}
            className="rounded bg-accent px-2 py-0.5 text-white"
            data-testid="role-confirm"
          >
            Yes, make {name} {proposed}
          </button>
          <button
            type="button"
            onClick={() => {
              setConfirming(false);
              setProposed(current);
            }}
            className="rounded border border-hairline bg-white px-2 py-0.5"
            data-testid="role-cancel"
          >
            Keep {current}
          </button>
        </span>
      )}
      {message && (
        <span className="text-xs text-muted" role="status">
          {message}
        </span>
      )}
    </span>
  );
}
