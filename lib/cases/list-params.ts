// The case list's query as the API and the export read it: one zod schema built from the rules in
// list-query.ts, so a shared link shows the same cases everywhere. The list screen in the browser
// reads the same rules without zod (readListParams there); everything else is re-exported from it.
import { z } from "@/lib/validation/zod";
import {
  BAD_SORT,
  DAY_MAX_CHARS,
  DEFAULT_SORT,
  LIST_MAX_CHARS,
  LIST_RULES,
  Q_MAX_CHARS,
  Q_TOO_LONG,
  RANGE_BACKWARDS,
  WHOLE_RULES,
  dayTooLong,
  flattenQuery,
  isBlank,
  isCalendarDay,
  listTooLong,
  notADay,
  readSort,
  splitList,
  wholeWords,
  type CaseFilters,
  type ListParams,
} from "./list-query";

export * from "./list-query";

const blank = (v: unknown) => (isBlank(v) ? undefined : v);

/** A comma list, each item checked by its rule; repeated or empty items are dropped. */
function commaList(rule: (typeof LIST_RULES)[keyof typeof LIST_RULES]) {
  return z.preprocess(
    blank,
    z
      .string()
      .max(LIST_MAX_CHARS, listTooLong(rule.what))
      .transform((raw, ctx) => {
        const read = splitList(rule, raw);
        if ("error" in read) {
          ctx.addIssue({ code: "custom", message: read.error });
          return z.NEVER;
        }
        return read.items;
      })
      .optional(),
  );
}

const day = (what: string) =>
  z.preprocess(blank, z.string().max(DAY_MAX_CHARS, dayTooLong(what)).refine(isCalendarDay, notADay(what)).optional());

const sortSchema = z.preprocess(
  blank,
  z
    .string()
    .transform((raw, ctx) => {
      const sort = readSort(raw);
      if (!sort) {
        ctx.addIssue({ code: "custom", message: BAD_SORT });
        return z.NEVER;
      }
      return sort;
    })
    .default(DEFAULT_SORT),
);

const whole = ({ what, min, max, fallback }: (typeof WHOLE_RULES)[keyof typeof WHOLE_RULES]) => {
  const words = wholeWords(what);
  return z.preprocess(
    blank,
    z.coerce
      .number({ message: words.notNumber })
      .int(words.notWhole)
      .min(min, words.below(min))
      .max(max, words.above(max))
      .default(fallback),
  );
};

export const listParamsSchema = z
  .object({
    status: commaList(LIST_RULES.status),
    trigger: commaList(LIST_RULES.trigger),
    cause: commaList(LIST_RULES.cause),
    class: commaList(LIST_RULES.class),
    site: commaList(LIST_RULES.site),
    from: day("From"),
    to: day("To"),
    q: z.preprocess(blank, z.string().trim().max(Q_MAX_CHARS, Q_TOO_LONG).optional()),
    sort: sortSchema,
    page: whole(WHOLE_RULES.page),
    pageSize: whole(WHOLE_RULES.pageSize),
  })
  .refine((p) => !p.from || !p.to || p.from <= p.to, { message: RANGE_BACKWARDS, path: ["to"] })
  .transform(({ sort, page, pageSize, ...rest }): ListParams => {
    const filters: CaseFilters = {};
    for (const [k, v] of Object.entries(rest)) {
      if (v !== undefined && !(Array.isArray(v) && v.length === 0)) (filters as Record<string, unknown>)[k] = v;
    }
    return { filters, sort, page, pageSize };
  });

type QueryInput = Parameters<typeof flattenQuery>[0];

/** Reads the query; throws a ZodError (the API's 400) when something is wrong. */
export function parseListParams(input: QueryInput): ListParams {
  return listParamsSchema.parse(flattenQuery(input));
}
