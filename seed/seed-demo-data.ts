import { count } from "drizzle-orm";
import type { MySql2Database } from "drizzle-orm/mysql2";
import { hashPassword } from "~/auth/password.server";
import * as schema from "~/db/schema";
import { demoPassword, demoPeople } from "./demo-people";
import { demoPersonId } from "./demo-person-ids";

type Database = MySql2Database<typeof schema>;

/** True when the database has no people yet (the seed's only trigger). */
export async function databaseIsEmpty(db: Database): Promise<boolean> {
  const [row] = await db.select({ people: count() }).from(schema.users);
  return (row?.people ?? 0) === 0;
}

/** Writes the demo data in one transaction. Call only on an empty database. */
export async function seedDemoData(db: Database): Promise<void> {
  const passwordHash = await hashPassword(demoPassword());
  await db.transaction(async (tx) => {
    for (const person of demoPeople) {
      const id = demoPersonId(person.roles[0]!);
      await tx
        .insert(schema.users)
        .values({ id, email: person.email, name: person.name, passwordHash });
      await tx
        .insert(schema.userRoles)
        .values(person.roles.map((role) => ({ userId: id, role })));
    }
  });
}
