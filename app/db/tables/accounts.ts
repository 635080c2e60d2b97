import {
  boolean,
  datetime,
  index,
  int,
  mysqlEnum,
  mysqlTable,
  primaryKey,
  longtext,
  text,
  uniqueIndex,
  varchar,
} from "drizzle-orm/mysql-core";
import { roles } from "~/lib/roles";

export const createdAt = () =>
  datetime("created_at", { mode: "date", fsp: 3 })
    .notNull()
    .$defaultFn(() => new Date());

/** People who sign in. `passwordHash` is null until an invited person sets one. */
export const users = mysqlTable(
  "users",
  {
    id: varchar("id", { length: 40 }).primaryKey(),
    email: varchar("email", { length: 254 }).notNull(),
    name: varchar("name", { length: 120 }).notNull(),
    passwordHash: varchar("password_hash", { length: 255 }),
    active: boolean("active").notNull().default(true),
    /** The locale numbers and days are shown in (app/lib/display-settings.ts); null until chosen. */
    locale: varchar("locale", { length: 8 }),
    /** The IANA time zone times are shown in; null until chosen (shown as UTC). */
    timeZone: varchar("time_zone", { length: 64 }),
    createdAt: createdAt(),
  },
  (table) => [
    uniqueIndex("users_email_unique").on(table.email),
    index("users_name_idx").on(table.name),
  ],
);

export const userRoles = mysqlTable(
  "user_roles",
  {
    userId: varchar("user_id", { length: 40 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    role: mysqlEnum("role", roles).notNull(),
  },
  (table) => [
    primaryKey({ columns: [table.userId, table.role] }),
    index("user_roles_role_idx").on(table.role),
  ],
);

/**
 * lucia sessions: the column names lucia's Drizzle adapter expects. The id is
 * the SHA-256 (hex) of the cookie's token, never the token (app/auth/session.server.ts).
 */
export const sessions = mysqlTable(
  "sessions",
  {
    id: varchar("id", { length: 255 }).primaryKey(),
    userId: varchar("user_id", { length: 40 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    expiresAt: datetime("expires_at", { mode: "date" }).notNull(),
    /** When the person signed in: no extension keeps a session past 30 days from here. */
    startedAt: datetime("started_at", { mode: "date" }).notNull(),
  },
  (table) => [index("sessions_user_idx").on(table.userId)],
);

/** Single-use links sent by e-mail: invitations and password resets. */
export const emailTokens = mysqlTable(
  "email_tokens",
  {
    id: int("id").autoincrement().primaryKey(),
    userId: varchar("user_id", { length: 40 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    purpose: mysqlEnum("purpose", ["invitation", "password-reset"]).notNull(),
    /** SHA-256 of the token, hex; the token itself is only in the e-mail. */
    tokenHash: varchar("token_hash", { length: 64 }).notNull(),
    expiresAt: datetime("expires_at", { mode: "date" }).notNull(),
    usedAt: datetime("used_at", { mode: "date" }),
    createdAt: createdAt(),
  },
  (table) => [
    uniqueIndex("email_tokens_hash_unique").on(table.tokenHash),
    index("email_tokens_user_idx").on(table.userId, table.purpose),
  ],
);

/** What the attempt counters count (app/auth/attempt-counters.server.ts). */
export const attemptRules = [
  "sign-in-account",
  "sign-in-address",
  "reset-account",
  "reset-address",
] as const;

/**
 * Attempts per rule and subject (an e-mail or a client address) in a fixed
 * window, counted with one atomic upsert so parallel requests never see the
 * same count; kept in the database so the limits hold across app servers.
 */
export const attemptCounters = mysqlTable(
  "attempt_counters",
  {
    rule: mysqlEnum("rule", attemptRules).notNull(),
    subject: varchar("subject", { length: 254 }).notNull(),
    attempts: int("attempts").notNull(),
    windowEndsAt: datetime("window_ends_at", {
      mode: "date",
      fsp: 3,
    }).notNull(),
  },
  (table) => [
    primaryKey({ columns: [table.rule, table.subject] }),
    index("attempt_counters_window_idx").on(table.windowEndsAt),
  ],
);

/**
 * Every e-mail the app sends. A message is written here first and marked sent
 * once the SMTP server has accepted it; unsent ones are retried. A one-time
 * link is kept apart from the text and dropped once the message is sent.
 */
export const mailOutbox = mysqlTable(
  "mail_outbox",
  {
    id: int("id").autoincrement().primaryKey(),
    toAddress: varchar("to_address", { length: 254 }).notNull(),
    subject: varchar("subject", { length: 255 }).notNull(),
    /** The text as sent, except that a one-time link is replaced by a note (app/mail/one-time-link.ts). */
    textBody: text("text_body").notNull(),
    /** The message's one-time link, kept only until SMTP has accepted it. */
    oneTimeLink: varchar("one_time_link", { length: 2048 }),
    createdAt: createdAt(),
    sentAt: datetime("sent_at", { mode: "date", fsp: 3 }),
    attempts: int("attempts").notNull().default(0),
    lastError: varchar("last_error", { length: 500 }),
  },
  (table) => [
    index("mail_outbox_created_idx").on(table.createdAt),
    index("mail_outbox_unsent_idx").on(table.sentAt, table.createdAt),
  ],
);

/** Files sent with an outbox message (a purchase order's PDF and CSV), kept with it. */
export const mailAttachments = mysqlTable(
  "mail_attachments",
  {
    id: int("id").autoincrement().primaryKey(),
    outboxId: int("outbox_id")
      .notNull()
      .references(() => mailOutbox.id),
    fileName: varchar("file_name", { length: 200 }).notNull(),
    contentType: varchar("content_type", { length: 100 }).notNull(),
    /** The file's bytes, base64. */
    contentBase64: longtext("content_base64").notNull(),
    byteSize: int("byte_size").notNull(),
  },
  (table) => [index("mail_attachments_outbox_idx").on(table.outboxId)],
);

/**
 * Personal API tokens for scripts and other tools (Authorization: Bearer …).
 * A token acts with the roles chosen at creation, never more than its owner
 * holds at the time of each request.
 */
export const apiTokens = mysqlTable(
  "api_tokens",
  {
    id: int("id").autoincrement().primaryKey(),
    userId: varchar("user_id", { length: 40 })
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    name: varchar("name", { length: 80 }).notNull(),
    /** SHA-256 of the token, hex; the token itself is shown once, at creation. */
    tokenHash: varchar("token_hash", { length: 64 }).notNull(),
    /** The first characters of the token, to tell tokens apart in lists. */
    tokenPrefix: varchar("token_prefix", { length: 12 }).notNull(),
    roles: varchar("roles", { length: 100 }).notNull(),
    createdAt: createdAt(),
    expiresAt: datetime("expires_at", { mode: "date" }),
    lastUsedAt: datetime("last_used_at", { mode: "date" }),
    revokedAt: datetime("revoked_at", { mode: "date" }),
  },
  (table) => [
    uniqueIndex("api_tokens_hash_unique").on(table.tokenHash),
    index("api_tokens_user_idx").on(table.userId, table.createdAt),
  ],
);
