"use client";

import { type FormEvent, useState } from "react";
import { errorMessage, useClassAction } from "./use-class-action";

type Member = { userId: string; displayName: string; email?: string; role: string };

/** The instructor's panel: join code (rotate), invitations by e-mail, members (remove), archive. */
export function ClassAdmin({ classId, joinCode, archived, members, invitations, meId }: { classId: string; joinCode: string; archived: boolean; members: Member[]; invitations: { id: string; email: string; expiresAt: string }[]; meId: string }) {
  const patch = useClassAction(`/api/v1/classes/${classId}`, "PATCH");
  const invite = useClassAction<{ invited: number; mailed: number }>(`/api/v1/classes/${classId}/invitations`);
  const [emails, setEmails] = useState("");

  function onInvite(e: FormEvent) {
    e.preventDefault();
    const list = emails.split(/[\s,;]+/).filter(Boolean);
    invite.mutate({ emails: list }, { onSuccess: () => setEmails("") });
  }

  return (
    <section aria-label="Class administration" className="no-print space-y-4 rounded-lg border border-line bg-white/60 p-3 text-sm">
      <div className="flex flex-wrap items-center gap-3">
        <span>Join code: <strong data-testid="join-code" className="font-mono text-base tracking-wider">{joinCode}</strong></span>
        <button type="button" disabled={archived || patch.isPending} onClick={() => patch.mutate({ rotateJoinCode: true })} className="rounded border border-line px-2 py-0.5 text-xs hover:border-ember disabled:opacity-40">
          New code (the old one stops working)
        </button>
        <button type="button" disabled={patch.isPending} onClick={() => patch.mutate({ archived: !archived })} className="ml-auto rounded border border-line px-2 py-0.5 text-xs hover:border-ember">
          {archived ? "Un-archive" : "Archive (read-only)"}
        </button>
      </div>
      {patch.isError && <p role="alert" className="text-over">{errorMessage(patch.error)}</p>}

      <form onSubmit={onInvite} noValidate aria-label="Invite by e-mail" className="space-y-1.5">
        <label className="block font-medium">
          Invite by e-mail
          <textarea value={emails} onChange={(e) => setEmails(e.target.value)} rows={2} disabled={archived} placeholder="one or more addresses, separated by commas or new lines" className="mt-1 w-full rounded border border-line bg-white px-2 py-1 font-normal" />
        </label>
        <button type="submit" disabled={archived || invite.isPending || emails.trim() === ""} className="rounded border border-ember px-3 py-1 text-ember disabled:opacity-40">Send invitations</button>
        {invite.isSuccess && <p role="status" className="text-ok">Invited {invite.data.invited}; the links work once and for 7 days.</p>}
        {invite.isError && <p role="alert" className="text-over">{errorMessage(invite.error)}</p>}
        {invitations.length > 0 && <p className="text-xs text-ink-soft">Waiting for: {invitations.map((i) => i.email).join(", ")}</p>}
      </form>

      <div>
        <h3 className="font-medium">Members</h3>
        <ul className="mt-1 divide-y divide-line">
          {members.map((m) => (
            <li key={m.userId} className="flex items-center gap-2 py-1" data-testid="class-member">
              <span className="min-w-0 flex-1 truncate">{m.displayName} <span className="text-xs text-ink-soft">{m.email}</span></span>
              <span className="text-xs text-ink-soft">{m.role}</span>
              {m.userId !== meId && <RemoveButton classId={classId} member={m} disabled={archived} />}
            </li>
          ))}
        </ul>
      </div>
    </section>
  );
}

function RemoveButton({ classId, member, disabled }: { classId: string; member: Member; disabled: boolean }) {
  const remove = useClassAction(`/api/v1/classes/${classId}/members/${member.userId}`, "DELETE");
  return (
    <>
      <button type="button" disabled={disabled || remove.isPending} onClick={() => remove.mutate(undefined)} className="text-xs text-over hover:underline disabled:opacity-40" aria-label={`Remove ${member.displayName} from the class`}>
        Remove
      </button>
      {remove.isError && <span role="alert" className="text-xs text-over">{errorMessage(remove.error)}</span>}
    </>
  );
}
