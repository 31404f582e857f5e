// Reads the EXPLAIN plan of every statement the hot paths send (case list, case page, search,
// similar cases, tallies, life section) and fails when any plan reads cases or findings by a
// sequential scan. The statements are caught as the app sends them, so the check follows the code.
import { sql } from "drizzle-orm";
import { db, pool } from "@/db";
import { findReadableCase, getCaseDetail } from "@/db/queries/case-read";
import { listCases } from "@/db/queries/case-list";
import { searchCases } from "@/db/queries/search";
import { findSimilarCases } from "@/lib/cases/similar-service";
import { loadLife } from "@/lib/tallies/life-service";
import { loadTallies } from "@/lib/tallies/tallies-service";
import { parseListParams } from "@/lib/cases/list-params";
import { parseSearchParams } from "@/lib/search/query-schema";
import { parseTallyFilters } from "@/lib/tallies/filters";
import { capture, GROWTH_PASS } from "./support/figures";
import { benchViewers } from "./support/viewers";

const WATCHED = new Set(["cases", "findings"]);
type PlanNode = { "Node Type": string; "Relation Name"?: string; Plans?: PlanNode[] };

function seqScans(node: PlanNode, out: string[] = []): string[] {
  if (node["Node Type"] === "Seq Scan" && node["Relation Name"] && WATCHED.has(node["Relation Name"])) out.push(node["Relation Name"]);
  for (const child of node.Plans ?? []) seqScans(child, out);
  return out;
}

try {
  // Small tables are read whole by choice; the check means something at the full size only.
  if (GROWTH_PASS) process.exit(0);
  const who = await benchViewers();
  const [{ id, number }] = (
    await db.execute<{ id: string; number: string }>(sql`select id, number from cases where status = 'signed' order by number limit 1`)
  ).rows;
  const list =
    (q: string, as: "manager" | "inspector" = "manager") =>
    () => {
      const p = parseListParams(new URLSearchParams(q));
      return listCases(p.filters, p.sort, p.page, p.pageSize, who[as]);
    };
  const paths: [string, () => Promise<unknown>][] = [
    ["case list, first page", list("")],
    ["case list, inspector", list("", "inspector")],
    ["case list, signed by removal day", list("status=signed&sort=removedOn:desc")],
    ["case list, deep page", list("page=200")],
    ["case page data", async () => getCaseDetail((await findReadableCase(number, who.manager))!.id, who.manager)],
    ["search, words", () => searchCases(parseSearchParams({ q: "spalling" }), who.engineer)],
    ["search, first view", () => searchCases(parseSearchParams({}), who.engineer)],
    ["similar cases", () => findSimilarCases(id, who.engineer)],
    ["tallies page data", () => loadTallies(parseTallyFilters({}), who.manager)],
    ["tallies, inspector", () => loadTallies(parseTallyFilters({}), who.inspector)],
    ["life section, all time", () => loadLife(parseTallyFilters({}), who.manager, "months")],
  ];
  let bad = 0;
  for (const [name, run] of paths) {
    const statements = await capture(run);
    const found: string[] = [];
    for (const s of statements) {
      if (!/^\s*(select|with)\b/i.test(s.config.text)) continue;
      const { rows } = await pool.query({ text: `explain (format json) ${s.config.text}`, values: s.config.values });
      found.push(...seqScans((rows[0]["QUERY PLAN"] as { Plan: PlanNode }[])[0].Plan));
    }
    console.log(
      `EXPLAIN ${name}: ${statements.length} statements, ${found.length ? `SEQ SCAN of ${[...new Set(found)].join(", ")} MISSED` : "no sequential scan of cases or findings OK"}`,
    );
    if (found.length) bad++;
  }
  if (bad) process.exitCode = 1;
} catch (err) {
  console.error(err);
  process.exitCode = 1;
} finally {
  await pool.end();
}
