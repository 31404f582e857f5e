// The demo photos as the seed stored them before the suite: rows, objects and history exactly as
// an upload leaves them, each photo on a finding of its own case. Only demo cases are read (filed
// before the demo's end date, numbers below the large generator's range) and only the seed's files.
import { sql } from "drizzle-orm";
import exifReader from "exif-reader";
import sharp from "sharp";
import { beforeAll, describe, expect, it } from "vitest";
import { photoKeys } from "@/lib/photos/keys";
import { sha256Hex } from "@/lib/photos/process";
import { getObject } from "@/lib/storage/s3";
import { db } from "../../support/db";

const ms = (v: unknown) => (v === null ? null : new Date(v as string).getTime());

type DemoPhoto = {
  id: string;
  case_id: string;
  number: string;
  status: string;
  received_at: string | null;
  signed_at: string | null;
  sha256: string;
  bytes: number;
  original_key: string;
  thumb_key: string;
  screen_key: string;
  file_name: string;
  component: string | null;
  row: string | null;
  clock_deg: number | null;
  finding_id: string | null;
  caption: string;
  taken_at: string | null;
  created_at: string;
  content_type: string;
  f_case: string | null;
  f_component: string | null;
  f_row: string | null;
  f_clock: number | null;
  f_code: string | null;
  removed_on: string;
  trigger: string;
};

let shots: DemoPhoto[];
beforeAll(async () => {
  shots = (
    await db.execute(sql`
    select p.*, c.number, c.status, c.received_at, c.signed_at, c.removed_on::text, c.trigger,
      f.case_id as f_case, f.component as f_component, f.row as f_row, f.clock_deg as f_clock, f.damage_code as f_code
    from photos p join cases c on c.id = p.case_id left join findings f on f.id = p.finding_id
    where c.created_at <= '2026-11-30T16:00:00Z' and split_part(c.number, '-', 3)::int < 50000
      and p.file_name ~ '^tl-[0-9]{2}-[0-9]{5}-.+\\.jpg$'
    order by c.number, p.created_at`)
  ).rows as DemoPhoto[];
});

describe("demo photos in the seeded casebook", () => {
  it("has at least 50 photos over at least 20 cases past the field stage", () => {
    expect(shots.length).toBeGreaterThanOrEqual(50); // demo scenario: about 25 cases with 2–4 photos
    expect(new Set(shots.map((s) => s.case_id)).size).toBeGreaterThanOrEqual(20);
    expect(shots.every((s) => s.status !== "field")).toBe(true);
  });

  it("ties every photo to a finding of its own case, with that finding's part, row and clock position", () => {
    for (const s of shots) {
      expect(s.finding_id, s.file_name).not.toBeNull();
      expect(s.f_case, s.file_name).toBe(s.case_id);
      expect([s.component, s.row, s.clock_deg], s.file_name).toEqual([s.f_component, s.f_row, s.f_clock]);
      expect(s.caption.length).toBeGreaterThan(20);
    }
  });

  it("was taken while the bearing was on the bench, and left signed cases signed", () => {
    for (const s of shots) {
      expect(s.taken_at, s.file_name).not.toBeNull();
      expect(ms(s.taken_at)!, s.file_name).toBeGreaterThanOrEqual(ms(s.received_at)!);
      if (s.signed_at) expect(ms(s.created_at)!, s.file_name).toBeLessThan(ms(s.signed_at)!);
    }
    expect(shots.filter((s) => s.status === "signed").length).toBeGreaterThan(shots.length / 2); // demo scenario: most photographed cases are signed
  });

  it("records each upload in the case history at its upload time", async () => {
    const events = (
      await db.execute(sql`
      select e.case_id, e.at, e.changes->0->>'to' as label from case_events e
      where e.action = 'photo-added' and e.case_id in (${sql.join([...new Set(shots.map((s) => sql`${s.case_id}::uuid`))], sql`, `)})`)
    ).rows as { case_id: string; at: string; label: string }[];
    for (const s of shots) {
      const e = events.find((x) => x.case_id === s.case_id && x.label === `${s.file_name} (${s.sha256.slice(0, 12)})`);
      expect(e, s.file_name).toBeDefined();
      expect(ms(e!.at)).toBe(ms(s.created_at));
    }
  });

  it("stores each original byte for byte under its content address, with a decodable thumbnail and screen image", async () => {
    for (const s of shots) {
      const keys = photoKeys(s.case_id, s.sha256);
      expect([s.original_key, s.screen_key, s.thumb_key]).toEqual([keys.original, keys.screen, keys.thumb]);
      const original = await getObject(s.original_key);
      expect(sha256Hex(original), s.file_name).toBe(s.sha256);
      expect(original.length).toBe(Number(s.bytes));
      expect(s.content_type).toBe("image/jpeg");
      const thumb = await sharp(await getObject(s.thumb_key))
        .raw()
        .toBuffer({ resolveWithObject: true });
      expect(Math.max(thumb.info.width, thumb.info.height)).toBe(320); // THUMB_EDGE of the photo pipeline
      const screen = await sharp(await getObject(s.screen_key)).metadata();
      expect([screen.format, screen.width, screen.height]).toEqual(["webp", 1200, 900]); // the pipeline never enlarges past the original
    }
  });

  it("marks every original as a demo in its EXIF", async () => {
    const s = shots[0];
    const meta = await sharp(await getObject(s.original_key)).metadata();
    const exif = exifReader(meta.exif!);
    expect(String(exif.Image?.ImageDescription)).toContain(`TEARLINE DEMO ${s.number}`);
    expect(exif.Image?.Orientation).toBe(1); // upright (EXIF 2.32, CIPA DC-008)
  });

  it("photographs the arc-burn cluster, the water-etch run and spalls on the cup so similar cases pair up", () => {
    const cupCases = (code: string, pred: (s: DemoPhoto) => boolean = () => true) =>
      new Set(shots.filter((s) => s.component === "cup" && s.f_code === code && pred(s)).map((s) => s.case_id)).size;
    // Welding removals at Marrow Junction in February–March 2026 (demo scenario: arc burns after the track 4 work).
    expect(
      cupCases("electrical.arc", (s) => s.trigger === "welding" && s.removed_on >= "2026-02-09" && s.removed_on <= "2026-03-06"),
    ).toBeGreaterThanOrEqual(4);
    expect(cupCases("corrosion.moisture", (s) => s.removed_on >= "2025-03-24" && s.removed_on <= "2025-06-13")).toBeGreaterThanOrEqual(4); // demo scenario: spring 2025 water run
    expect(cupCases("fatigue.subsurface")).toBeGreaterThanOrEqual(3);
  });
});
