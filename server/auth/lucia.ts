import "server-only";
import { Mysql2Adapter } from "@lucia-auth/adapter-mysql";
import { type DatabaseSession, type DatabaseUser, Lucia, TimeSpan } from "lucia";
import { pool } from "@/db/client";
import { getSessionWithUser } from "@/db/queries/users";
import type { Role } from "@/db/schema";
import { env } from "@/server/env";

const HTTPS = () => env().APP_URL.startsWith("https://");

export function sessionCookieName(): string {
  return HTTPS() ? "__Host-sinkwise_session" : "sinkwise_session";
}

/**
 * The stock adapter, but a session and its user are read in one round trip (it sends two, on
 * every signed-in request), and only the user's columns the app reads: never the password hash.
 */
class SessionAdapter extends Mysql2Adapter {
  override async getSessionAndUser(sessionId: string): Promise<[DatabaseSession | null, DatabaseUser | null]> {
    const found = await getSessionWithUser({ id: sessionId });
    if (!found) return [null, null];
    const { session, user } = found;
    return [
      { id: session.id, userId: session.userId, expiresAt: session.expiresAt, attributes: {} },
      { id: user.id, attributes: { email: user.email, display_name: user.displayName, role: user.role, length_units: user.lengthUnits, temperature_unit: user.temperatureUnit } },
    ];
  }
}

// Lucia v3 is kept inside this one module (and session.ts) so it can be swapped later.
function createLucia() {
  const adapter = new SessionAdapter(pool(), { user: "user", session: "user_session" });
  return new Lucia(adapter, {
    sessionExpiresIn: new TimeSpan(30, "d"),
    sessionCookie: {
      // Over https the __Host- prefix makes the browser refuse the cookie unless it is
      // Secure, for this exact host and path / (no sibling subdomain can set or read it).
      name: sessionCookieName(),
      expires: false,
      attributes: {
        secure: HTTPS(),
        sameSite: "lax",
      },
    },
    getUserAttributes: (row) => ({
      email: row.email,
      displayName: row.display_name,
      role: row.role,
      lengthUnits: row.length_units,
      temperatureUnit: row.temperature_unit,
    }),
  });
}

type SinkwiseLucia = ReturnType<typeof createLucia>;
const holder = globalThis as unknown as { sinkwiseLucia?: SinkwiseLucia };

export function lucia(): SinkwiseLucia {
  holder.sinkwiseLucia ??= createLucia();
  return holder.sinkwiseLucia;
}

declare module "lucia" {
  interface Register {
    Lucia: SinkwiseLucia;
    DatabaseUserAttributes: {
      email: string;
      display_name: string;
      role: Role;
      length_units: "metric" | "imperial";
      temperature_unit: "C" | "F";
    };
  }
}
