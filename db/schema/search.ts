// Search index rows, one per case, kept current by database triggers on cases and findings
// (db/migrations, search triggers): the columns the facets filter on and the findings as
// arrays for facets and similar-case retrieval, in a narrow table that scans fast when no
// words are asked; and the same row with the narrative as a weighted tsvector, so a text
// search reads one table without a join. Nothing in the app writes these tables; they are
// derived data and can be rebuilt.
import { customType, date, index, integer, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { cases } from "./cases";

const tsvector = customType<{ data: string }>({ dataType: () => "tsvector" });

/** The columns both search tables carry (fresh builders for each table). */
const searchColumns = () => ({
  caseId: uuid("case_id")
    .primaryKey()
    .references(() => cases.id, { onDelete: "cascade" }),
  number: text("number").notNull(),
  status: text("status").notNull(),
  trigger: text("trigger").notNull(),
  primaryCause: text("primary_cause"),
  bearingClass: text("bearing_class").notNull(),
  siteId: uuid("site_id"),
  createdBy: text("created_by"),
  removedOn: date("removed_on"),
  // Removal date, or the filing date where none was given: "earlier case" and date filters use it.
  sortOn: date("sort_on").notNull(),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull(),
  maxSeverity: integer("max_severity").notNull().default(0),
  damageCodes: text("damage_codes").array().notNull().default([]),
  components: text("components").array().notNull().default([]),
  // "component|damage code" and "component|family" keys for similar-case retrieval.
  findingKeys: text("finding_keys").array().notNull().default([]),
  familyKeys: text("family_keys").array().notNull().default([]),
  // Case number, serial, car mark and number in one string for trigram matching.
  identifiers: text("identifiers").notNull(),
});

export const caseSearch = pgTable("case_search", searchColumns(), (t) => [
  index("case_search_identifiers_trgm_idx").using("gin", t.identifiers.op("gin_trgm_ops")),
  index("case_search_codes_idx").using("gin", t.damageCodes),
  index("case_search_components_idx").using("gin", t.components),
  index("case_search_finding_keys_idx").using("gin", t.findingKeys),
  index("case_search_family_keys_idx").using("gin", t.familyKeys),
  index("case_search_sort_idx").on(t.sortOn, t.createdAt),
  index("case_search_site_idx").on(t.siteId),
  // Similar-case retrieval: same trigger and class, or same cause, by index.
  index("case_search_trigger_class_idx").on(t.trigger, t.bearingClass),
  index("case_search_cause_idx").on(t.primaryCause),
]);

// The narrative of each case: identifiers (weight A), teardown, findings and verdict (B),
// field notes and corrective action (C), and its damage codes and parts as "dc:"/"pc:" lexemes.
export const caseSearchText = pgTable("case_search_text", { ...searchColumns(), document: tsvector("document").notNull() }, (t) => [
  index("case_search_text_document_idx").using("gin", t.document),
]);

// Distinct words seen in case narratives: a typo's nearest known words come from here.
export const searchWords = pgTable("search_words", { word: text("word").primaryKey() }, (t) => [
  index("search_words_trgm_idx").using("gin", t.word.op("gin_trgm_ops")),
]);

export type CaseSearchRow = typeof caseSearch.$inferSelect;
