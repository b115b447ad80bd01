"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { ROLE_LABELS } from "@/lib/auth/roles";
import { fetchJson } from "@/components/ui/fetch-json";
import { useMe } from "./use-me";

export function AccountMenu() {
  const me = useMe();
  const router = useRouter();
  const queryClient = useQueryClient();

  async function signOut() {
    await fetchJson("/api/v1/auth/signout", { method: "POST" });
    queryClient.clear();
    router.push("/");
    router.refresh();
  }

  return (
    <span className="flex items-center gap-3">
      <span data-testid="signed-in-user" className="text-ink">
        {me.data ? (
          <>
            {me.data.displayName}{" "}
            <span className="rounded bg-ember-soft px-1.5 py-0.5 text-xs text-ember">{ROLE_LABELS[me.data.role]}</span>
          </>
        ) : (
          "…"
        )}
      </span>
      <button type="button" onClick={signOut} className="text-ink-soft hover:text-ember">
        Sign out
      </button>
    </span>
  );
}
