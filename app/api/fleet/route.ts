// GET /api/fleet - the fleet list in use; POST - upload a fleet list CSV (units still in service)
import { NextResponse } from "next/server";
import { badRequest, HttpError } from "@/lib/http/errors";
import { withRole } from "@/lib/http/handler";
import { readFormLimited, readTextLimited } from "@/lib/http/body";
import { FLEET_COLUMNS, parseFleetCsv } from "@/lib/tallies/fleet-csv";
import { currentFleetBatch, storeFleetList } from "@/lib/tallies/fleet-service";

export const dynamic = "force-dynamic";
const MAX_BYTES = 20 * 1024 * 1024;
const TOO_LARGE = "The fleet list";

export const GET = withRole("tallies:read", async () => NextResponse.json({ batch: await currentFleetBatch(), columns: FLEET_COLUMNS }));

async function csvText(req: Request): Promise<string> {
  const length = Number(req.headers.get("content-length") ?? 0);
  if (length > MAX_BYTES) throw new HttpError(413, "too-large", "The file is larger than 20 MB; split the fleet list.");
  const type = req.headers.get("content-type") ?? "";
  if (type.startsWith("multipart/form-data")) {
    const file = (await readFormLimited(req, MAX_BYTES + 64 * 1024, TOO_LARGE)).get("file");
    if (!(file instanceof File)) throw badRequest("Attach the fleet list as a CSV file in the field named file.");
    if (file.size > MAX_BYTES) throw new HttpError(413, "too-large", "The file is larger than 20 MB; split the fleet list.");
    return file.text();
  }
  if (type.startsWith("text/csv") || type.startsWith("text/plain")) return readTextLimited(req, MAX_BYTES, TOO_LARGE);
  throw badRequest("Send the fleet list as text/csv or as a multipart form with a file field.");
}

export const POST = withRole("fleet:upload", async ({ req, user }) => {
  const parsed = parseFleetCsv(await csvText(req));
  if (!parsed.ok) {
    return NextResponse.json(
      {
        error: `The fleet list has ${parsed.errorCount} problem${parsed.errorCount === 1 ? "" : "s"}; nothing was stored.`,
        code: "invalid-rows",
        rows: parsed.errors,
        errorCount: parsed.errorCount,
      },
      { status: 422 },
    );
  }
  const stored = await storeFleetList(parsed.rows, user.id);
  return NextResponse.json(stored, { status: 201 });
});
