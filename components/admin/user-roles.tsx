"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { ROLE_LABELS, ROLE_NAMES, type RoleName } from "@/lib/auth/roles";
import { ApiClientError, fetchJson } from "@/components/ui/fetch-json";

type Row = { id: string; email: string; displayName: string; role: RoleName };

export function UserRoles({ selfId }: { selfId: string }) {
  const queryClient = useQueryClient();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const users = useQuery({
    queryKey: ["admin", "users"],
    queryFn: async () => (await fetchJson<{ users: Row[] }>("/api/v1/admin/users")).users,
  });
  const change = useMutation({
    mutationFn: ({ id, role }: { id: string; role: RoleName }) =>
      fetchJson<{ user: Row }>(`/api/v1/admin/users/${id}`, { method: "PATCH", body: { role } }),
    onSuccess: ({ user }) => {
      setMessage({ ok: true, text: `${user.email} is now ${ROLE_LABELS[user.role]}.` });
      void queryClient.invalidateQueries({ queryKey: ["admin", "users"] });
    },
    onError: (e) => setMessage({ ok: false, text: e instanceof ApiClientError ? e.message : "Could not change the role." }),
  });

  if (users.isPending) return <p className="text-sm text-ink-soft">Loading users…</p>;
  if (users.isError) return <p className="text-sm text-over">{users.error.message}</p>;

  return (
    <div className="space-y-3">
      {message && (
        <p role="status" className={`text-sm ${message.ok ? "text-ok" : "text-over"}`}>{message.text}</p>
      )}
      <table className="w-full border-collapse text-sm">
        <thead>
          <tr className="border-b border-line text-left text-ink-soft">
            <th className="py-2 pr-4 font-medium">Name</th>
            <th className="py-2 pr-4 font-medium">E-mail</th>
            <th className="py-2 font-medium">Role</th>
          </tr>
        </thead>
        <tbody>
          {users.data.map((u) => (
            <tr key={u.id} className="border-b border-line/60">
              <td className="py-2 pr-4">{u.displayName}{u.id === selfId && <span className="text-ink-soft"> (you)</span>}</td>
              <td className="py-2 pr-4 font-mono text-xs">{u.email}</td>
              <td className="py-2">
                <select
                  aria-label={`Role of ${u.email}`}
                  value={u.role}
                  disabled={change.isPending}
                  onChange={(e) => change.mutate({ id: u.id, role: e.target.value as RoleName })}
                  className="rounded border border-line bg-white px-2 py-1"
                >
                  {ROLE_NAMES.map((r) => (
                    <option key={r} value={r}>{ROLE_LABELS[r]}</option>
                  ))}
                </select>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
