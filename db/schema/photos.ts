// Photos: the original kept byte-for-byte as evidence, plus derivatives without metadata.
import { bigint, index, integer, pgTable, text, timestamp, unique, uuid } from "drizzle-orm/pg-core";
import { user } from "./auth";
import { cases } from "./cases";
import { findings } from "./findings";

export const photos = pgTable(
  "photos",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    caseId: uuid("case_id")
      .notNull()
      .references(() => cases.id, { onDelete: "cascade" }),
    component: text("component"),
    row: text("row"),
    findingId: uuid("finding_id").references(() => findings.id, { onDelete: "set null" }),
    clockDeg: integer("clock_deg"),
    caption: text("caption").notNull().default(""),
    sha256: text("sha256").notNull(),
    contentType: text("content_type").notNull(),
    bytes: bigint("bytes", { mode: "number" }).notNull(),
    width: integer("width").notNull(),
    height: integer("height").notNull(),
    originalKey: text("original_key").notNull(),
    screenKey: text("screen_key").notNull(),
    thumbKey: text("thumb_key").notNull(),
    fileName: text("file_name").notNull().default(""),
    takenAt: timestamp("taken_at", { withTimezone: true }),
    uploadedBy: text("uploaded_by").references(() => user.id),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("photos_case_idx").on(t.caseId), unique("photos_case_sha_uq").on(t.caseId, t.sha256)],
);

export type Photo = typeof photos.$inferSelect;
