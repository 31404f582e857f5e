// p50 / p95 of the case list (first page; filtered and sorted; a deep page) and of the case page's
// data, through the query functions the app uses, each beside its raw-SQL floor.
import { sql } from "drizzle-orm";
import { db } from "@/db";
import { findReadableCase, getCaseDetail } from "@/db/queries/case-read";
import { listCases } from "@/db/queries/case-list";
import { parseListParams } from "@/lib/cases/list-params";
import { BENCH_CASES, runBench, measure, type Call } from "./support/figures";
import { benchViewers } from "./support/viewers";

const TARGET_MS = 50;
const REPEATS = 6;

await runBench(async () => {
  const who = await benchViewers();
  const list = (label: string, query: string, as: "manager" | "inspector" = "manager"): Call => ({
    label: `${as} ${label}`,
    run: () => {
      const p = parseListParams(new URLSearchParams(query));
      return listCases(p.filters, p.sort, p.page, p.pageSize, who[as]);
    },
  });
  const { rows: top } = await db.execute<{ site: string; trigger: string }>(sql`
    select (select s.code from sites s join cases c on c.site_id = s.id group by s.code order by count(*) desc limit 1) as site,
      (select trigger from cases group by trigger order by count(*) desc limit 1) as trigger`);
  const { site, trigger } = top[0];
  const deepPage = Math.max(2, Math.floor(BENCH_CASES / 25 / 20)); // about 5 % into the list

  console.log(`case bench: ${BENCH_CASES.toLocaleString("en-US")} cases`);
  await measure("case list, first page", [list("default", ""), list("default", "", "inspector"), list("100 rows", "pageSize=100")], {
    repeats: REPEATS * 2,
    target: TARGET_MS,
  });
  await measure(
    "case list, filtered and sorted",
    [
      list("signed, removed on", "status=signed&sort=removedOn:desc"),
      list(`site ${site} by car`, `site=${site}&sort=car:asc`),
      list(`trigger ${trigger} by number`, `trigger=${trigger}&sort=number:asc`),
      list("class F, 2 years", `class=F&from=2024-01-01&to=2025-12-31&sort=removedOn:asc`),
      list("inspector signed", "status=signed&sort=removedOn:desc", "inspector"),
    ],
    { repeats: REPEATS, target: TARGET_MS },
  );
  await measure(
    "case list, deep page",
    [
      list(`page ${deepPage}`, `page=${deepPage}`),
      list(`signed page ${Math.ceil(deepPage / 2)}`, `status=signed&sort=removedOn:desc&page=${Math.ceil(deepPage / 2)}`),
    ],
    { repeats: REPEATS * 2, target: TARGET_MS },
  );

  const { rows: picks } = await db.execute<{ id: string; number: string }>(
    sql`select id, number from cases order by md5(id::text) limit 20`,
  );
  await measure(
    "case page data",
    picks.map((p) => ({
      label: p.number,
      run: async () => getCaseDetail((await findReadableCase(p.number, who.manager))!.id, who.manager),
    })),
    { repeats: 2, target: TARGET_MS },
  );
});
