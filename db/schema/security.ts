// Sign-in failure counters (shared by every app process) and the append-only audit log.
import { index, integer, jsonb, pgTable, primaryKey, text, timestamp, uuid } from "drizzle-orm/pg-core";

/** Failed sign-ins per key ("ip:<address>" or "account:<e-mail>") in the current window. */
export const signInFailures = pgTable(
  "sign_in_failures",
  {
    key: text("key").notNull(),
    failures: integer("failures").notNull().default(0),
    windowStart: timestamp("window_start", { withTimezone: true }).notNull().defaultNow(),
    lockedUntil: timestamp("locked_until", { withTimezone: true }),
  },
  (t) => [primaryKey({ columns: [t.key] })],
);

/** Who did what, when and from where. Rows are never changed or removed (a trigger refuses). */
export const auditLog = pgTable(
  "audit_log",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
    kind: text("kind").notNull(),
    actorId: text("actor_id"),
    actorEmail: text("actor_email"),
    subject: text("subject"),
    address: text("address"),
    detail: jsonb("detail").$type<Record<string, unknown>>().notNull().default({}),
  },
  (t) => [index("audit_log_at_idx").on(t.at), index("audit_log_kind_idx").on(t.kind, t.at)],
);

export type AuditRow = typeof auditLog.$inferSelect;
