// The removal-yield page's own settings on top of the Tallies filters.
import { z } from "@/lib/validation/zod";

const blankToUndefined = (v: unknown) => (typeof v === "string" && v.trim() === "" ? undefined : v);

export const yieldQuerySchema = z.object({
  miss: z.preprocess(
    blankToUndefined,
    z.coerce
      .number({ message: "The missed-call window is a number of days." })
      .int("Use whole days for the missed-call window.")
      .min(1, "The missed-call window is at least 1 day.")
      .max(730, "The missed-call window is at most 730 days.")
      .default(90),
  ),
});

export type YieldQuery = z.infer<typeof yieldQuerySchema>;

export function readYieldQuery(params: Record<string, string | string[] | undefined>): YieldQuery {
  const miss = Array.isArray(params.miss) ? params.miss[0] : params.miss;
  const parsed = yieldQuerySchema.safeParse({ miss });
  return parsed.success ? parsed.data : { miss: 90 };
}
