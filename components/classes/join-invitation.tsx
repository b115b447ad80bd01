"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { type FormEvent, useState } from "react";
import { errorMessage, fieldError, useClassAction } from "./use-class-action";

/** The invitation link's page: join as the signed-in account, or make the account and join. */
export function JoinInvitation({ token, signedIn, email }: { token: string; signedIn: boolean; email: string }) {
  const router = useRouter();
  const join = useClassAction<{ class: { id: string } }>("/api/v1/classes/join", "POST", { refresh: false });
  const [name, setName] = useState("");
  const [password, setPassword] = useState("");
  const go = (r: { class: { id: string } }) => {
    router.push(`/classes/${r.class.id}`);
    router.refresh();
  };
  if (signedIn) {
    return (
      <div className="space-y-2 text-sm">
        <button type="button" disabled={join.isPending} onClick={() => join.mutate({ token }, { onSuccess: go })} className="rounded bg-ember px-3 py-1 text-white disabled:opacity-40">Join the class</button>
        {join.isError && <p role="alert" className="text-over">{errorMessage(join.error)}</p>}
      </div>
    );
  }
  function onSubmit(e: FormEvent) {
    e.preventDefault();
    join.mutate({ token, displayName: name, password }, { onSuccess: go });
  }
  return (
    <div className="space-y-3 text-sm">
      <form onSubmit={onSubmit} noValidate aria-label="Create your account and join" className="space-y-2">
        <p>New to Sinkwise? Make your account for <strong>{email}</strong> and join.</p>
        <label className="block">Your name<input value={name} onChange={(e) => setName(e.target.value)} autoComplete="name" className="w-full rounded border border-line bg-white px-2 py-1" /></label>
        {fieldError(join.error, "displayName") && <p className="text-over">{fieldError(join.error, "displayName")}</p>}
        <label className="block">Password (at least 10 characters)<input type="password" value={password} onChange={(e) => setPassword(e.target.value)} autoComplete="new-password" className="w-full rounded border border-line bg-white px-2 py-1" /></label>
        {fieldError(join.error, "password") && <p className="text-over">{fieldError(join.error, "password")}</p>}
        <button type="submit" disabled={join.isPending} className="rounded bg-ember px-3 py-1 text-white disabled:opacity-40">Create my account and join</button>
        {join.isError && !fieldError(join.error, "displayName") && !fieldError(join.error, "password") && <p role="alert" className="text-over">{errorMessage(join.error)}</p>}
      </form>
      <p className="text-ink-soft">Have an account already? <Link href="/signin" className="text-ember underline">Sign in</Link>, then open this link again.</p>
    </div>
  );
}
