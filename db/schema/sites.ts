// Car shops, wheel shops and teardown labs, each with the end-play limit policy it applies.
import { boolean, numeric, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";

export const SITE_KINDS = ["car-shop", "wheel-shop", "lab"] as const;
export type SiteKind = (typeof SITE_KINDS)[number];

export const sites = pgTable("sites", {
  id: uuid("id").primaryKey().defaultRandom(),
  code: text("code").notNull().unique(),
  name: text("name").notNull(),
  kind: text("kind").$type<SiteKind>().notNull(),
  railway: text("railway").notNull(),
  location: text("location").notNull().default(""),
  // Limit policy in inches (numeric keeps exact decimals); defaults are the common interchange practice.
  endPlayMaxIn: numeric("end_play_max_in", { precision: 8, scale: 5, mode: "number" }).notNull().default(0.0625),
  dialSpreadIn: numeric("dial_spread_in", { precision: 8, scale: 5, mode: "number" }).notNull().default(0.002),
  tapeSpreadIn: numeric("tape_spread_in", { precision: 8, scale: 5, mode: "number" }).notNull().default(0.015625),
  // Above this a reading is refused until confirmed as typed (a slip of the hand, not end play); lib/field/plausibility.ts.
  plausibleMaxIn: numeric("plausible_max_in", { precision: 8, scale: 5, mode: "number" }).notNull().default(0.25),
  // What one removal costs the owner here (wheelset change, car out of service, lab time), in US dollars; set by an admin.
  removalCostUsd: numeric("removal_cost_usd", { precision: 12, scale: 2, mode: "number" }),
  active: boolean("active").notNull().default(true),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
});

export type Site = typeof sites.$inferSelect;
