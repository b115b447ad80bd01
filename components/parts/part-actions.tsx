"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { buttonClass, quietButtonClass } from "./labels";
import { usePartAction } from "./use-parts";
import { VerifyControl } from "./verify-control";

/** Edit, duplicate, delete and (admins) verify: each button only where the viewer may. */
export function PartActions({ id, name, canEdit, isAdmin, verified, provenance }: { id: string; name: string; canEdit: boolean; isAdmin: boolean; verified: boolean; provenance: string }) {
  const router = useRouter();
  const { duplicate, remove } = usePartAction(id);
  const [error, setError] = useState<string | null>(null);
  const fail = (e: unknown) => setError(e instanceof Error ? e.message : "That did not work.");

  return (
    <div className="space-y-2">
      <div className="flex flex-wrap gap-2">
        {canEdit && <Link href={`/parts/${id}/edit`} className={buttonClass}>Edit</Link>}
        <button
          type="button"
          className={quietButtonClass}
          disabled={duplicate.isPending}
          onClick={() => duplicate.mutate(undefined, { onSuccess: (copy) => router.push(`/parts/${copy.id}`), onError: fail })}
        >
          Duplicate
        </button>
        {canEdit && (
          <button
            type="button"
            className={`${quietButtonClass} hover:border-over hover:text-over`}
            disabled={remove.isPending}
            onClick={() => {
              if (!window.confirm(`Delete “${name}”? Its attachments go too.`)) return;
              remove.mutate(undefined, { onSuccess: () => router.push("/parts"), onError: fail });
            }}
          >
            Delete
          </button>
        )}
      </div>
      {isAdmin && <VerifyControl id={id} verified={verified} provenance={provenance} />}
      {error && <p role="alert" className="text-sm text-over">{error}</p>}
    </div>
  );
}
