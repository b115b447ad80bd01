import Link from "next/link";
import { currentUser } from "@/server/auth/session";
import { NotificationBell } from "@/components/reviews/notification-bell";
import { AccountMenu } from "./account-menu";
import { navFor } from "./nav-items";

export async function SiteHeader() {
  const user = await currentUser().catch(() => null);
  const items = navFor(user?.role ?? null);
  return (
    <header className="no-print border-b border-line bg-paper-deep/70">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3">
        <Link href="/" className="flex items-center gap-2 font-semibold tracking-tight">
          <span aria-hidden className="temp-scale inline-block h-4 w-4 rounded-sm" />
          <span>Sinkwise</span>
        </Link>
        <nav aria-label="Main" className="flex flex-wrap gap-4 text-sm">
          {items.map((item) => (
            <Link key={item.href} href={item.href} className="text-ink-soft hover:text-ember">
              {item.label}
            </Link>
          ))}
        </nav>
        <div className="ml-auto text-sm">
          {user ? (
            <span className="flex items-center gap-2">
              <NotificationBell />
              <AccountMenu />
            </span>
          ) : (
            <span className="flex items-center gap-3">
              <Link href="/signin" className="hover:text-ember">Sign in</Link>
              <Link href="/signup" className="rounded bg-ember px-3 py-1 text-white hover:opacity-90">Create account</Link>
            </span>
          )}
        </div>
      </div>
    </header>
  );
}
