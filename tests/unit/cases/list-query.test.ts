// The list screen reads its URL without zod (lib/cases/list-query.ts); the API reads the same query
// through the zod schema (lib/cases/list-params.ts). Both are built from one set of rules, and here
// they must give the same state, or the same first refusal, for any query.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { listParamsSchema } from "@/lib/cases/list-params";
import { DEFAULT_LIST_PARAMS, flattenQuery, readListParams } from "@/lib/cases/list-query";

const SEED = Number(process.env.FC_SEED ?? 20261204);

function zodReading(q: URLSearchParams) {
  const r = listParamsSchema.safeParse(flattenQuery(q));
  return r.success ? { params: r.data } : { params: DEFAULT_LIST_PARAMS, error: r.error.issues[0]?.message };
}

// Values near every rule's edges: good words, bad words, blanks, limits, odd numbers and dates.
const listValue = fc.oneof(
  fc.constantFrom(
    "field",
    "bench,signoff",
    "signed,signed,",
    "open",
    "F,other",
    "Z",
    "wayside-hot",
    "Hot Box",
    "water-ingress,seal",
    "mjc,PYC",
    "M J",
    " , ,",
    "",
  ),
  fc
    .array(fc.constantFrom("field", "bench", "x", "F", "K", "mjc", "a.b", "-bad", " ", "A_1", "é"), { maxLength: 4 })
    .map((xs) => xs.join(",")),
  fc.string({ maxLength: 12 }),
  fc.constant("a,".repeat(1001)),
);
const dayValue = fc.oneof(
  fc.constantFrom(
    "2026-03-14",
    "2024-02-29",
    "2026-02-29",
    "2026-13-01",
    "14/03/2026",
    "2026-3-14",
    "",
    "  ",
    "2026-03-14x",
    "20260-03-14",
  ),
  fc.date({ min: new Date("1990-01-01"), max: new Date("2040-12-31"), noInvalidDate: true }).map((d) => d.toISOString().slice(0, 10)),
);
const numberValue = fc.oneof(
  fc.constantFrom(
    "0",
    "1",
    "2.5",
    "abc",
    "",
    " 7 ",
    "1e3",
    "0x10",
    "Infinity",
    "-3",
    "9",
    "10",
    "200",
    "201",
    "100000",
    "100001",
    "1e21",
    "5000",
  ),
  fc.integer({ min: -5, max: 250 }).map(String),
);
const sortValue = fc.constantFrom(
  "removedOn:asc",
  "updatedAt:desc",
  "car:asc",
  "colour:asc",
  "removedOn:up",
  "removedOn",
  "serial:asc:x",
  "",
  ":",
);
const qValue = fc.oneof(
  fc.string({ maxLength: 20 }),
  fc.constant("x".repeat(101)),
  fc.constant(` ${"y".repeat(100)} `),
  fc.constant("   "),
);

const entry = fc.oneof(
  fc.tuple(fc.constantFrom("status", "trigger", "cause", "class", "site"), listValue),
  fc.tuple(fc.constantFrom("from", "to"), dayValue),
  fc.tuple(fc.constantFrom("page", "pageSize"), numberValue),
  fc.tuple(fc.constant("sort"), sortValue),
  fc.tuple(fc.constant("q"), qValue),
  fc.tuple(fc.constantFrom("other", "Page"), fc.string({ maxLength: 5 })),
);

describe("the list screen's reading of the URL", () => {
  it("gives the API's state, or its first refusal, for any query", () => {
    fc.assert(
      fc.property(fc.array(entry, { maxLength: 8 }), (entries) => {
        const q = new URLSearchParams(entries);
        expect(readListParams(q)).toEqual(zodReading(q));
      }),
      { seed: SEED, numRuns: 3000 },
    );
  });

  it.each([
    // the rules' edges, written out (arithmetic and the refusals in list-params.test.ts)
    "status=signoff,bench&site=mjc&sort=car:asc&page=2&pageSize=50",
    "from=2026-06-01&to=2026-05-31",
    "from=2026-06-01&to=2026-05-31&page=0",
    "page=1e21",
    "pageSize=Infinity",
    "q=%20%20&status=&page=",
    "class=F,Z&status=open",
  ])("%s", (query) => {
    const q = new URLSearchParams(query);
    expect(readListParams(q)).toEqual(zodReading(q));
  });

  it("refuses with the words the API uses", () => {
    // the refusal list-params.test.ts holds the API to
    expect(readListParams(new URLSearchParams("from=2026-06-01&to=2026-05-31"))).toEqual({
      params: DEFAULT_LIST_PARAMS,
      error: "The removal dates must run forward: From is after To.",
    });
  });
});
