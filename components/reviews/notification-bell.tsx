"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import { useEffect, useState } from "react";
import { useMarkRead, useNotifications } from "./use-reviews";

/** The header bell: review requests, verdicts and comments, with the unread count. */
export function NotificationBell() {
  const [open, setOpen] = useState(false);
  const notes = useNotifications();
  const markRead = useMarkRead();
  const unread = notes.data?.unread ?? 0;
  const pathname = usePathname();
  // Moving to another page (a link, back/forward, a redirect) closes the list.
  useEffect(() => setOpen(false), [pathname]);
  useEffect(() => {
    if (!open) return;
    const onKey = (e: KeyboardEvent) => e.key === "Escape" && setOpen(false);
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [open]);
  return (
    <div className="relative">
      <button
        type="button"
        onClick={() => setOpen((o) => !o)}
        aria-expanded={open}
        aria-label={unread ? `Notifications, ${unread} unread` : "Notifications"}
        className="relative flex items-center rounded px-2 py-1 text-ink-soft hover:text-ember"
      >
        <svg aria-hidden viewBox="0 0 24 24" className="h-5 w-5" fill="none" stroke="currentColor" strokeWidth="1.8">
          <path d="M6 16V11a6 6 0 1 1 12 0v5l1.5 2h-15L6 16Z" strokeLinejoin="round" />
          <path d="M10 20a2 2 0 0 0 4 0" />
        </svg>
        {unread > 0 && (
          <span data-testid="unread-count" className="absolute -right-1 -top-1 min-w-4 rounded-full bg-ember px-1 text-center text-[10px] font-semibold leading-4 text-white">
            {unread > 99 ? "99+" : unread}
          </span>
        )}
      </button>
      {open && (
        <div role="dialog" aria-label="Notifications" className="absolute right-0 z-20 mt-2 w-80 rounded-lg border border-line bg-paper p-2 text-sm shadow-lg">
          <div className="mb-1 flex items-center justify-between px-1">
            <span className="font-medium">Notifications</span>
            {unread > 0 && (
              <button type="button" onClick={() => markRead.mutate(undefined)} className="text-xs text-ink-soft hover:text-ember">
                Mark all read
              </button>
            )}
          </div>
          {notes.isError && <p className="px-1 text-over">{notes.error.message}</p>}
          {notes.data && notes.data.items.length === 0 && <p className="px-1 py-2 text-ink-soft">Nothing yet.</p>}
          <ul className="max-h-96 overflow-y-auto">
            {notes.data?.items.map((n) => (
              <li key={n.id}>
                <Link
                  href={n.href ? n.href : n.reviewId ? `/reviews/${n.reviewId}` : n.buildId ? `/builds/${n.buildId}` : "/reviews"}
                  onClick={() => {
                    setOpen(false);
                    if (!n.readAt) markRead.mutate([n.id]);
                  }}
                  className={`block rounded px-2 py-1.5 hover:bg-ember-soft ${n.readAt ? "text-ink-soft" : "font-medium"}`}
                >
                  {n.text}
                  <span className="block text-xs font-normal text-ink-soft">{new Date(n.createdAt).toLocaleString()}</span>
                </Link>
              </li>
            ))}
          </ul>
        </div>
      )}
    </div>
  );
}
