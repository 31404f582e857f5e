// GET /api/cases and GET /api/cases/export against the running app, over a casebook made here.
// Expected sets come from plain JavaScript over the fixture table, independent of the SQL.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { canReadCase } from "@/lib/cases/access";
import { parseCsv } from "@/lib/csv";
import { TRIGGERS } from "@/lib/classification";
import { ApiClient, as } from "../../support/api";
import { buildCasebook, removeCasebook, TOKEN, type Built } from "./list-fixture";

type Row = {
  id: string;
  number: string;
  status: string;
  removedOn: string | null;
  carNumber: string;
  endPlayMeanIn: number | null;
  triggerLabel: string;
  causeLabel: string | null;
  siteCode: string | null;
};
type Page = { rows: Row[]; total: number; page: number; pageSize: number; pageCount: number; error?: string };

let book: Built[] = [];
beforeAll(async () => {
  book = await buildCasebook();
});
afterAll(async () => {
  await removeCasebook(book);
});

async function list(query: string, who: Parameters<typeof as>[0] = "engineer") {
  const res = await (await as(who)).json<Page>("GET", `/api/cases?q=${TOKEN}&pageSize=200&${query}`);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body;
}
const numbersOf = (rows: { number: string }[]) => rows.map((r) => r.number).sort();
const expected = (keep: (b: Built) => boolean) => numbersOf(book.filter(keep));

describe("paging", () => {
  it("gives the total with every page and splits the set without overlap", async () => {
    const p1 = await list("pageSize=10&sort=number:asc");
    const p2 = await list("pageSize=10&sort=number:asc&page=2");
    expect(p1.total).toBe(12); // twelve cases in the fixture table
    expect(p1.rows).toHaveLength(10);
    expect(p1.pageCount).toBe(2); // ceil(12 / 10)
    expect(p2.total).toBe(12);
    expect(p2.rows).toHaveLength(2);
    expect(numbersOf([...p1.rows, ...p2.rows])).toEqual(expected(() => true));
  });

  it("past the last page gives no rows but still the total", async () => {
    const p = await list("pageSize=10&page=3");
    expect(p.rows).toEqual([]);
    expect(p.total).toBe(12);
  });
});

describe("each filter, and filters together", () => {
  const cases: [string, (b: Built) => boolean][] = [
    ["status=signed", (b) => b.status === "signed"],
    ["status=field,bench", (b) => b.status === "field" || b.status === "bench"],
    ["trigger=wayside-hot", (b) => b.trigger === "wayside-hot"],
    ["trigger=hand-roll,welding", (b) => ["hand-roll", "welding"].includes(b.trigger)],
    ["cause=water-ingress", (b) => b.cause === "water-ingress"],
    ["cause=seal,no-defect", (b) => b.cause === "seal" || b.cause === "no-defect"],
    ["class=F", (b) => b.cls === "F"],
    ["class=other,D", (b) => b.cls === "other" || b.cls === "D"],
    ["site=PYC", (b) => b.site === "PYC"],
    ["site=mjc,OSW", (b) => b.site === "MJC" || b.site === "OSW"],
    ["from=2026-03-01&to=2026-06-15", (b) => b.removedOn !== null && b.removedOn >= "2026-03-01" && b.removedOn <= "2026-06-15"],
    ["from=2026-07-01", (b) => b.removedOn !== null && b.removedOn >= "2026-07-01"],
    ["to=2025-12-31", (b) => b.removedOn !== null && b.removedOn <= "2025-12-31"],
    ["status=signed&trigger=wayside-hot", (b) => b.status === "signed" && b.trigger === "wayside-hot"],
    ["site=PYC&status=signoff", (b) => b.site === "PYC" && b.status === "signoff"],
    [
      "trigger=wayside-hot&class=F&from=2026-01-01&to=2026-04-30",
      (b) =>
        b.trigger === "wayside-hot" && b.cls === "F" && b.removedOn !== null && b.removedOn >= "2026-01-01" && b.removedOn <= "2026-04-30",
    ],
  ];
  it.each(cases)("%s", async (query, keep) => {
    const p = await list(query);
    const want = expected(keep);
    expect(want.length).toBeGreaterThan(0); // a filter that matches nothing here would prove little
    expect(numbersOf(p.rows)).toEqual(want);
    expect(p.total).toBe(want.length);
  });

  it("finds a car written with or without the space, and a case by its number", async () => {
    const c3 = book.find((b) => b.key === "c3")!;
    const engineer = await as("engineer");
    for (const q of ["LSTX%20123456", "lstx123456", c3.number]) {
      const res = await engineer.json<Page>("GET", `/api/cases?q=${q}`);
      expect(numbersOf(res.body.rows), q).toEqual([c3.number]);
    }
  });

  it("reads % and _ in the search as plain characters", async () => {
    expect((await list("q=%25")).total).toBe(0); // "%" would match everything as a LIKE wildcard
  });
});

describe("sorting", () => {
  const byNumberDesc = (a: Built, b: Built) => (a.number < b.number ? 1 : -1); // the tie-break: newest number first
  const order = (rows: Row[]) => rows.map((r) => r.number);
  const nullsLast =
    <T>(get: (b: Built) => T | null, cmp: (x: T, y: T) => number) =>
    (a: Built, b: Built) => {
      const x = get(a),
        y = get(b);
      if (x === null && y === null) return byNumberDesc(a, b);
      if (x === null) return 1;
      if (y === null) return -1;
      return cmp(x, y) || byNumberDesc(a, b);
    };
  const asc = <T>(x: T, y: T) => (x < y ? -1 : x > y ? 1 : 0);
  const desc = <T>(x: T, y: T) => -asc(x, y);

  it("sorts by removal date both ways, undated cases last either way", async () => {
    const up = await list("sort=removedOn:asc");
    expect(order(up.rows)).toEqual([...book].sort(nullsLast((b) => b.removedOn, asc)).map((b) => b.number));
    const down = await list("sort=removedOn:desc");
    expect(order(down.rows)).toEqual([...book].sort(nullsLast((b) => b.removedOn, desc)).map((b) => b.number));
    expect(down.rows.at(-1)!.removedOn).toBeNull();
  });

  it("sorts cars by mark, then by car number as a number", async () => {
    // Same mark throughout: shorter numbers first, so 5 < 88 < 100 < 9001 (arithmetic order).
    const num = (b: Built) => Number(b.carNumber);
    expect(order((await list("sort=car:asc")).rows)).toEqual([...book].sort((a, b) => num(a) - num(b)).map((b) => b.number));
    expect(order((await list("sort=car:desc")).rows)).toEqual([...book].sort((a, b) => num(b) - num(a)).map((b) => b.number));
  });

  it("sorts stages in the order a case moves through them", async () => {
    const rank = { field: 0, bench: 1, signoff: 2, signed: 3 };
    const got = (await list("sort=status:asc")).rows.map((r) => rank[r.status as keyof typeof rank]);
    expect(got).toEqual([...got].sort((a, b) => a - b));
    const back = (await list("sort=status:desc")).rows.map((r) => rank[r.status as keyof typeof rank]);
    expect(back).toEqual([...back].sort((a, b) => b - a));
  });

  it("sorts end play numerically, unmeasured last", async () => {
    expect(order((await list("sort=endPlay:desc")).rows)).toEqual([...book].sort(nullsLast((b) => b.endPlay, desc)).map((b) => b.number));
  });

  it("sorts triggers by the label people read, not the code", async () => {
    const label = (code: string) => TRIGGERS.find((t) => t.code === code)!.label;
    const rows = (await list("sort=trigger:asc")).rows;
    expect(rows.map((r) => r.triggerLabel)).toEqual(book.map((b) => label(b.trigger)).sort(asc));
  });
});

describe("refusing bad parameters with a clear message", () => {
  it.each([
    ["page=0", /Page must be at least 1/],
    ["pageSize=500", /Page size must be at most 200/],
    ["sort=colour:asc", /Sort must be a column and a direction/],
    ["status=open", /Unknown stage "open"/],
    ["class=Q", /Unknown bearing class "Q"/],
    ["from=2026-02-30", /From must be a real date/],
    ["from=2026-06-02&to=2026-06-01", /From is after To/],
    ["site=ZZZ", /Unknown site "ZZZ"/],
    ["trigger=no-such-trigger", /Unknown trigger "no-such-trigger"/],
    ["cause=no-such-cause", /Unknown cause "no-such-cause"/],
  ])("%s", async (query, message) => {
    for (const path of ["/api/cases", "/api/cases/export"]) {
      const res = await (await as("engineer")).json<{ error: string; code: string }>("GET", `${path}?${query}`);
      expect(res.status, path).toBe(400);
      expect(res.body.code).toBe("bad-request");
      expect(res.body.error).toMatch(message);
    }
  });

  it("asks a visitor who is not signed in to sign in", async () => {
    for (const path of ["/api/cases", "/api/cases/export"]) expect((await new ApiClient().get(path)).status).toBe(401);
  });
});

describe("an inspector's reach", () => {
  const viewerOf = (id: string, siteId: string | null) => ({ id, role: "inspector", siteId });

  it("the Pellham Yard inspector sees Pellham cases and the ones filed there, not Marrow Junction's", async () => {
    const pellham = book.find((b) => b.filer === "pellham")!; // c9: filed by the Pellham inspector at MJC
    const pycSite = book.find((b) => b.site === "PYC")!.siteId;
    const rows = (await list("", "inspector.pellham")).rows;
    expect(numbersOf(rows)).toEqual(expected((b) => canReadCase(viewerOf(pellham.createdBy, pycSite), b)));
    expect(numbersOf(rows)).toEqual(expected((b) => b.site === "PYC" || b.filer === "pellham")); // the rule in words
    const mjcOnly = book.filter((b) => b.site === "MJC" && b.filer !== "pellham").map((b) => b.number);
    for (const n of mjcOnly) expect(rows.map((r) => r.number)).not.toContain(n);
  });

  it("the Marrow Junction inspector sees Marrow Junction cases and the ones filed elsewhere by them", async () => {
    const rows = (await list("", "inspector")).rows;
    expect(numbersOf(rows)).toEqual(expected((b) => b.site === "MJC" || b.filer === "inspector"));
  });

  it("a filter cannot widen an inspector's reach", async () => {
    const rows = (await list("site=MJC", "inspector.pellham")).rows;
    expect(numbersOf(rows)).toEqual(expected((b) => b.site === "MJC" && b.filer === "pellham"));
  });

  it("an inspector's export holds the same cases as the inspector's list", async () => {
    const csv = await exportCsv("sort=number:asc", "inspector.pellham");
    const rows = (await list("sort=number:asc", "inspector.pellham")).rows;
    expect(csv.records.slice(1).map((r) => r[0])).toEqual(rows.map((r) => r.number));
  });
});

async function exportCsv(query: string, who: Parameters<typeof as>[0] = "engineer") {
  const res = await (await as(who)).get(`/api/cases/export?q=${TOKEN}&${query}`);
  expect(res.status).toBe(200);
  const bytes = new Uint8Array(await res.arrayBuffer());
  const raw = new TextDecoder("utf-8", { ignoreBOM: true }).decode(bytes); // keep the byte-order mark to check it
  return { res, bytes, raw, records: parseCsv(raw.replace(/^\uFEFF/, "")) };
}

describe("CSV export", () => {
  it("downloads as a dated CSV file with a header line", async () => {
    const { res, bytes, raw, records } = await exportCsv("status=signed");
    expect([...bytes.slice(0, 3)]).toEqual([0xef, 0xbb, 0xbf]); // UTF-8 byte-order mark (Unicode Standard §2.6), so spreadsheets read UTF-8
    expect(res.headers.get("content-type")).toMatch(/^text\/csv; charset=utf-8/);
    // RFC 6266 attachment with a file name; the date is today's in UTC.
    expect(res.headers.get("content-disposition")).toBe(
      `attachment; filename="tearline-cases-${new Date().toISOString().slice(0, 10)}.csv"`,
    );
    expect(raw.startsWith("\uFEFFCase number,Stage,Car mark,Car number,")).toBe(true);
    expect(records[0]).toContain("End play (in)");
    expect(raw.split("\r\n").length).toBeGreaterThan(2); // RFC 4180 §2.1: records end with CRLF
    expect(res.headers.get("x-total-count")).toBe(String(records.length - 1));
    expect(res.headers.get("x-export-capped")).toBeNull(); // far under the cap
  });

  it("holds the same cases, in the same order, as the filtered list", async () => {
    for (const query of ["sort=removedOn:asc", "status=signed,signoff&sort=car:desc", "site=PYC&sort=trigger:asc"]) {
      const rows = (await list(query)).rows;
      const { records } = await exportCsv(query);
      expect(
        records.slice(1).map((r) => r[0]),
        query,
      ).toEqual(rows.map((r) => r.number));
    }
  });

  it("quotes commas and quotes, and guards a cell that would run as a formula", async () => {
    const { raw, records } = await exportCsv("sort=number:asc");
    const c4 = book.find((b) => b.key === "c4")!;
    const c5 = book.find((b) => b.key === "c5")!;
    const serialCol = records[0].indexOf("Serial");
    // RFC 4180 §2.6–2.7: a field with a comma or quote is quoted and its quotes doubled.
    expect(raw).toContain(`"${TOKEN}-comma,""quoted"""`);
    expect(records.find((r) => r[0] === c4.number)![serialCol]).toBe(c4.serialText);
    // OWASP CSV Injection: a leading = gets an apostrophe.
    expect(records.find((r) => r[0] === c5.number)![serialCol]).toBe(`'${c5.serialText}`);
    expect(records.find((r) => r[0] === book.find((b) => b.key === "c7")!.number)![records[0].indexOf("Bearing class")]).toBe(
      "AP-X, compact",
    );
  });

  it("writes end play to four decimals and dates as ISO", async () => {
    const { records } = await exportCsv("sort=number:asc");
    const c4 = records.find((r) => r[0] === book.find((b) => b.key === "c4")!.number)!;
    expect(c4[records[0].indexOf("End play (in)")]).toBe("0.0712"); // fixture value, four places
    expect(c4[records[0].indexOf("Removed on")]).toBe("2026-03-20"); // ISO 8601 calendar date
  });
});

describe("the export cap", () => {
  it("stops at the cap, keeps list order and says how many matched", async () => {
    const { exportCases } = await import("@/db/queries/case-list");
    const { userId } = await import("../../support/factories");
    const viewer = { id: await userId("analyst"), role: "analyst", siteId: null };
    const run = await exportCases({ q: TOKEN }, { field: "number", dir: "asc" }, viewer, { cap: 5, batchSize: 2 });
    expect(run.total).toBe(12);
    expect(run.capped).toBe(true);
    const got: string[] = [];
    for await (const batch of run.batches()) got.push(...batch.map((r) => r.number));
    expect(got).toEqual(
      book
        .map((b) => b.number)
        .sort()
        .slice(0, 5),
    );
  });
});
