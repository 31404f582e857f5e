// GET /api/codes?list=damage[&includeRetired=1] - a classification list for pickers (any signed-in person)
import { NextResponse } from "next/server";
import { z } from "@/lib/validation/zod";
import { codeEntries } from "@/lib/codes/code-service";
import { parseQuery, withRole } from "@/lib/http/handler";
import { listSchema } from "@/lib/validation/code-entry";

const querySchema = z.object({
  list: listSchema,
  includeRetired: z.enum(["0", "1", "true", "false"], { message: "includeRetired is 1 or 0." }).optional(),
});

export const GET = withRole(null, async ({ req }) => {
  const { list, includeRetired } = parseQuery(req, querySchema);
  const rows = await codeEntries(list, { includeRetired: includeRetired === "1" || includeRetired === "true" });
  return NextResponse.json({
    codes: rows.map((r) => ({
      code: r.code,
      label: r.label,
      description: r.description,
      family: r.family,
      isoMode: r.isoMode,
      synonyms: r.synonyms,
      sortOrder: r.sortOrder,
      retired: r.retiredAt !== null,
    })),
  });
});
