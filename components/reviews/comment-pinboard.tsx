"use client";

import { useRouter } from "next/navigation";
import { type FormEvent, useState } from "react";
import { ApiClientError } from "@/components/ui/fetch-json";
import type { Anchors, CommentItem } from "./types";
import { useComment } from "./use-reviews";

type Kind = "node" | "link" | "figure";
const KIND_LABEL: Record<Kind, string> = { node: "Nodes", link: "Links", figure: "Figures" };

/**
 * The heat path's nodes and links (and the Budget's figures) to pin comments on, the thread
 * grouped by what each comment is pinned to, and the comment form.
 */
export function CommentPinboard({ reviewId, anchors, comments, canComment }: { reviewId: string; anchors: Anchors; comments: CommentItem[]; canComment: boolean }) {
  const router = useRouter();
  const add = useComment(reviewId);
  const [anchor, setAnchor] = useState<{ kind: Kind; key: string } | null>(null);
  const [body, setBody] = useState("");
  const err = add.error instanceof ApiClientError ? add.error : null;
  const labelOf = (kind: Kind, key: string) => anchors[`${kind}s`].find((a) => a.key === key)?.label ?? key;
  const countOn = (kind: Kind, key: string) => comments.filter((c) => c.anchorKind === kind && c.anchorKey === key).length;

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    if (!anchor) return;
    add.mutate({ anchor, body }, { onSuccess: () => { setBody(""); router.refresh(); } });
  }

  return (
    <div className="grid gap-4 md:grid-cols-[18rem_1fr]">
      <nav aria-label="Heat path" className="space-y-3 text-sm">
        {(["node", "link", "figure"] as const).map((kind) => (
          <div key={kind}>
            <h3 className="mb-1 text-xs font-medium uppercase tracking-wide text-ink-soft">{KIND_LABEL[kind]}</h3>
            {anchors[`${kind}s`].length === 0 && <p className="text-xs text-ink-soft">none in this revision</p>}
            <ul className="space-y-0.5">
              {anchors[`${kind}s`].map((a) => {
                const on = anchor?.kind === kind && anchor.key === a.key;
                const n = countOn(kind, a.key);
                return (
                  <li key={a.key}>
                    <button
                      type="button"
                      onClick={() => setAnchor({ kind, key: a.key })}
                      aria-pressed={on}
                      data-anchor={`${kind}:${a.key}`}
                      className={`w-full rounded px-2 py-0.5 text-left ${on ? "bg-ember-soft text-ember" : "hover:bg-paper-deep"}`}
                    >
                      {a.label} <span className="font-mono text-[11px] text-ink-soft">{a.key}</span>
                      {n > 0 && <span className="ml-1 rounded bg-ember px-1 text-[10px] text-white">{n}</span>}
                    </button>
                  </li>
                );
              })}
            </ul>
          </div>
        ))}
      </nav>
      <div className="space-y-4">
        <section aria-label="Comments" className="space-y-2">
          <h3 className="font-medium">Comments</h3>
          {comments.length === 0 && <p className="text-sm text-ink-soft">No comments yet.</p>}
          <ol className="space-y-2">
            {comments.map((c) => (
              <li key={c.id} data-testid="review-comment" className="rounded border border-line bg-white/70 p-2 text-sm">
                <div className="mb-0.5 flex flex-wrap items-center gap-2 text-xs text-ink-soft">
                  <span className="rounded bg-paper-deep px-1.5 font-mono">📌 {c.anchorKind} {c.anchorKey}</span>
                  <span>{labelOf(c.anchorKind, c.anchorKey)}</span>
                  <span className="ml-auto">{c.authorName} · {new Date(c.createdAt).toLocaleString()}</span>
                </div>
                <p className="whitespace-pre-wrap">{c.body}</p>
              </li>
            ))}
          </ol>
        </section>
        {canComment && (
          <form onSubmit={onSubmit} noValidate className="space-y-2 text-sm" aria-label="Pin a comment">
            <p className="text-ink-soft">
              {anchor ? (
                <>Pinned to {anchor.kind} <span className="font-mono">{anchor.key}</span> ({labelOf(anchor.kind, anchor.key)})</>
              ) : (
                "Pick a node, link or figure to pin the comment to."
              )}
            </p>
            <label className="block">
              <span className="sr-only">Comment</span>
              <textarea value={body} onChange={(e) => setBody(e.target.value)} rows={3} maxLength={4000} aria-label="Comment" className="w-full rounded border border-line bg-white px-2 py-1 focus:border-ember focus:outline-none" />
            </label>
            {err && <p role="alert" className="text-over">{err.message}</p>}
            <button type="submit" disabled={!anchor || !body.trim() || add.isPending} className="rounded bg-ember px-3 py-1 font-medium text-white hover:opacity-90 disabled:opacity-50">
              Pin the comment
            </button>
          </form>
        )}
      </div>
    </div>
  );
}
