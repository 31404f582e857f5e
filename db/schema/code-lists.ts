// Tearline's classification lists (damage codes, root causes, triggers), editable by admins.
// Codes are never deleted once in use, only retired, so old cases keep their meaning.
import { integer, pgTable, primaryKey, text, timestamp } from "drizzle-orm/pg-core";

export const CODE_LISTS = ["damage", "cause", "trigger"] as const;
export type CodeListName = (typeof CODE_LISTS)[number];

export const codeEntries = pgTable(
  "code_entries",
  {
    list: text("list").$type<CodeListName>().notNull(),
    code: text("code").notNull(),
    label: text("label").notNull(),
    description: text("description").notNull().default(""),
    family: text("family"),
    isoMode: text("iso_mode"),
    synonyms: text("synonyms").array().notNull().default([]),
    sortOrder: integer("sort_order").notNull().default(0),
    retiredAt: timestamp("retired_at", { withTimezone: true }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.list, t.code] })],
);

export type CodeEntry = typeof codeEntries.$inferSelect;
