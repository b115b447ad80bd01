import "server-only";
import { and, desc, eq, inArray, isNull, sql } from "drizzle-orm";
import { db } from "../client";
import { notifications, type NOTIFICATION_KINDS } from "../schema";

export interface NotificationRow {
  id: string;
  kind: (typeof NOTIFICATION_KINDS)[number];
  reviewId: string | null;
  buildId: string | null;
  href: string | null;
  text: string;
  readAt: Date | null;
  createdAt: Date;
}

/** The newest notifications of a user and how many are unread in all. */
export async function listNotifications({ userId, limit = 30 }: { userId: string; limit?: number }): Promise<{ items: NotificationRow[]; unread: number }> {
  const items = await db()
    .select({
      id: notifications.id,
      kind: notifications.kind,
      reviewId: notifications.reviewId,
      buildId: notifications.buildId,
      href: notifications.href,
      text: notifications.text,
      readAt: notifications.readAt,
      createdAt: notifications.createdAt,
    })
    .from(notifications)
    .where(eq(notifications.userId, userId))
    .orderBy(desc(notifications.createdAt), desc(notifications.id))
    .limit(limit);
  const counted = await db()
    .select({ n: sql<number>`count(*)` })
    .from(notifications)
    .where(and(eq(notifications.userId, userId), isNull(notifications.readAt)));
  return { items, unread: Number(counted[0]?.n ?? 0) };
}

/** Marks the given notifications of the user as read (all of them when `ids` is absent). */
export async function markNotificationsRead({ userId, ids }: { userId: string; ids?: readonly string[] }): Promise<number> {
  if (ids && ids.length === 0) return 0;
  const [result] = await db()
    .update(notifications)
    .set({ readAt: new Date() })
    .where(and(eq(notifications.userId, userId), isNull(notifications.readAt), ids ? inArray(notifications.id, [...ids]) : undefined));
  return result.affectedRows;
}
