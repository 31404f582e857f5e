// The searches the search bench times, in four kinds: words of the trade (with typos and shop
// words), codes and facets, identifiers taken from the database (serials, cars, case numbers),
// and the page's first view; a few run as an inspector.
import { sql } from "drizzle-orm";
import type { Db } from "@/db";

export type BenchQuery = { query: string; asInspector?: boolean };
export type SearchKinds = Record<"words" | "codes" | "identifiers" | "first view", BenchQuery[]>;

const WORDS = [
  "spalling cup",
  "spaling",
  "rust",
  "milky grease",
  "water etch",
  "arc burn",
  "welding current",
  "debris dents",
  "gritty grease",
  "brinell dents",
  "heat tint ribs",
  "seal",
  "grease loss",
  "creep journal",
  "lot C-2207",
  "fretting",
  "flaking",
  "pitting",
  "no defect found",
  "seal drag cold",
  "bent cage",
  "craters roller spacing",
  "emulsified",
  '"fatigue spall"',
  // Part and row words name findings: a part alone ("cup", "roller") holds most of the casebook.
  "cup",
  "cone",
  "roller",
  "lubricant",
  "spall cup outboard row",
  "cone inboard row fretting",
];
const TYPOS = ["milkey greese", "emulsfied", "brinnel", "fretign", "spaled cone"];
const FACETS = [
  "trigger=wayside-hot",
  "code=fatigue.subsurface&component=cup",
  "status=signed&class=F&severity=3",
  "site=PYC&from=2020-01-01&to=2021-12-31",
  "cause=water-ingress,debris-ingress",
  "component=seal-inboard,seal-outboard&sort=severity",
];
const MIXED = [
  "q=spalling&trigger=wayside-hot,hand-roll",
  "q=rust&site=MJC&sort=newest",
  "q=milky&severity=2&page=3",
  "q=arc&code=electrical.arc&status=signed",
  "q=dents&from=2022-01-01",
];

export async function benchQueries(db: Db): Promise<SearchKinds> {
  const { rows } = await db.execute<{ serial: string; car: string; number: string }>(sql`
    select serial, car_mark || ' ' || car_number as car, number from cases where serial <> '' order by md5(id::text) limit 4`);
  const q = (text: string) => `q=${encodeURIComponent(text)}`;
  return {
    words: [
      ...WORDS.map((w) => ({ query: q(w) })),
      ...TYPOS.map((w) => ({ query: q(w) })),
      { query: q("spalling"), asInspector: true },
      { query: q("rust"), asInspector: true },
    ],
    codes: [...FACETS.map((f) => ({ query: f })), ...MIXED.map((m) => ({ query: m })), { query: "trigger=hand-roll", asInspector: true }],
    identifiers: [
      ...rows.flatMap((r) => [{ query: q(r.serial.slice(-6)) }, { query: q(r.car) }]),
      ...rows.slice(0, 2).map((r) => ({ query: q(r.number) })),
    ],
    "first view": [{ query: "" }, { query: "", asInspector: true }],
  };
}
