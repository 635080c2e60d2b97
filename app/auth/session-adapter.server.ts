/**
 * lucia's storage of sessions: the Drizzle adapter for MariaDB, except that reading a
 * session also reads its person's roles, in the same query. Every signed-in request
 * validates its session, so this is one round trip to the database per request instead
 * of two (the session with its person, then the roles).
 */
import { DrizzleMySQLAdapter } from "@lucia-auth/adapter-drizzle";
import { eq, sql } from "drizzle-orm";
import type { DatabaseSession, DatabaseUser } from "lucia";
import type { Database } from "~/db/client.server";
import { sessions, userRoles, users } from "~/db/schema";
import type { Role } from "~/lib/roles";

/** The session with its person and roles, by the session id: the SQL built once per database. */
function sessionAndUserQuery(database: Database) {
  return database
    .select({
      expiresAt: sessions.expiresAt,
      startedAt: sessions.startedAt,
      userId: users.id,
      email: users.email,
      name: users.name,
      active: users.active,
      locale: users.locale,
      timeZone: users.timeZone,
      role: userRoles.role,
    })
    .from(sessions)
    .innerJoin(users, eq(users.id, sessions.userId))
    .leftJoin(userRoles, eq(userRoles.userId, users.id))
    .where(eq(sessions.id, sql.placeholder("sessionId")))
    .prepare();
}

export class SessionAdapter extends DrizzleMySQLAdapter {
  /** Every signed-in request reads its session: Drizzle builds the statement's text once. */
  private readonly sessionAndUser: ReturnType<typeof sessionAndUserQuery>;

  constructor(database: Database) {
    super(database, sessions, users);
    this.sessionAndUser = sessionAndUserQuery(database);
  }

  /** The session, its person (the columns lucia hands on) and the person's roles; nulls when unknown. */
  override async getSessionAndUser(
    sessionId: string,
  ): Promise<[DatabaseSession | null, DatabaseUser | null]> {
    // One row per role (a person without roles gives one row with a null role).
    const rows = await this.sessionAndUser.execute({ sessionId });
    const [row] = rows;
    if (!row) return [null, null];
    const roles = rows.flatMap((each): Role[] =>
      each.role === null ? [] : [each.role],
    );
    return [
      {
        id: sessionId,
        userId: row.userId,
        expiresAt: row.expiresAt,
        attributes: { startedAt: row.startedAt },
      },
      {
        id: row.userId,
        attributes: {
          email: row.email,
          name: row.name,
          active: row.active,
          locale: row.locale,
          timeZone: row.timeZone,
          roles,
        },
      },
    ];
  }
}
