"use client";

import { type FormEvent, useState } from "react";
import { ApiClientError } from "@/components/ui/fetch-json";
import { useAddMember, useMembers, useRemoveMember } from "./use-members";

/** The owner's list of people the build is shared with: add by e-mail (view or edit), remove. */
export function MembersPanel({ buildId }: { buildId: string }) {
  const members = useMembers(buildId);
  const add = useAddMember(buildId);
  const remove = useRemoveMember(buildId);
  const [email, setEmail] = useState("");
  const [canEdit, setCanEdit] = useState(false);
  const err = add.error instanceof ApiClientError ? add.error : null;
  const fieldError = (name: string) => (err && err.path === name ? err.message : null);

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    add.mutate({ email, canEdit }, { onSuccess: () => { setEmail(""); setCanEdit(false); } });
  }

  const list = members.data?.members ?? [];
  return (
    <section aria-label="Shared with" className="no-print space-y-2 rounded-lg border border-line bg-white/60 p-3 text-sm" data-testid="members-panel">
      <h2 className="font-medium">Shared with</h2>
      <p className="text-xs text-ink-soft">People you name here see this build even while it is private; with “can edit” they save revisions too. Reviewers only view.</p>
      {members.isSuccess && list.length === 0 && <p className="text-ink-soft">Nobody yet.</p>}
      <ul className="space-y-1">
        {list.map((m) => {
          const { email: address } = m;
          const who = address ?? m.displayName ?? "";
          return (
            <li key={who} className="flex items-center gap-2" data-testid="build-member">
              <span className="min-w-0 flex-1 truncate">{who}</span>
              <span className="shrink-0 text-xs text-ink-soft">{m.canEdit ? "can edit" : "views"}</span>
              {address !== undefined && (
                <button type="button" onClick={() => remove.mutate(address)} disabled={remove.isPending} className="shrink-0 text-xs text-over hover:underline" aria-label={`Stop sharing with ${address}`}>
                  Remove
                </button>
              )}
            </li>
          );
        })}
      </ul>
      <form onSubmit={onSubmit} noValidate className="space-y-1.5" aria-label="Share with someone">
        <input
          type="email"
          value={email}
          onChange={(e) => setEmail(e.target.value)}
          placeholder="their e-mail"
          aria-label="E-mail of the person to share with"
          aria-invalid={fieldError("email") ? true : undefined}
          className="w-full rounded border border-line bg-white px-2 py-1"
        />
        <div className="flex items-center gap-3">
          <label className="flex items-center gap-1.5">
            <input type="checkbox" checked={canEdit} onChange={(e) => setCanEdit(e.target.checked)} aria-invalid={fieldError("canEdit") ? true : undefined} />
            can edit
          </label>
          <button type="submit" disabled={add.isPending || email.trim() === ""} className="ml-auto rounded border border-ember px-3 py-1 text-ember disabled:opacity-40">
            Share
          </button>
        </div>
      </form>
      {err && <p role="alert" className="text-over">{err.message}</p>}
      {add.isSuccess && !add.isPending && <p role="status" className="text-xs text-ok">{add.data.message}</p>}
      {members.isError && <p className="text-over">{members.error.message}</p>}
      {remove.isError && <p role="alert" className="text-over">{remove.error.message}</p>}
    </section>
  );
}
