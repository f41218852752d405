import { sql } from 'drizzle-orm';
import { integer, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';

/** People who can sign in. E-mail is stored trimmed and lower-cased by the API. */
export const users = pgTable(
  'users',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    email: text('email').notNull(),
    displayName: text('display_name').notNull(),
    /** argon2id PHC string (algorithm, parameters and salt travel with the hash). */
    passwordHash: text('password_hash').notNull(),
    /**
     * Every access token carries the version current when it was issued; raising it (password
     * reset) refuses them all at once. A counter, not a cut-off time, so no comparison depends on
     * whole-second `iat` values or on clocks agreeing between API instances and the database.
     */
    tokenVersion: integer('token_version').notNull().default(0),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    // lower() guards uniqueness even if a writer ever forgets to normalise the address.
    uniqueIndex('users_email_unique').on(sql`lower(${t.email})`),
  ],
);

export type UserRow = typeof users.$inferSelect;
