// The invented demo photos, without a database: drawing is deterministic and shows the finding's
// damage, every photo is marked as a demo, and the plan photographs the casebook's stories.
import { createHash } from "node:crypto";
import exifReader from "exif-reader";
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { takenAtFromExif } from "@/lib/photos/taken-at";
import { DEFAULT_END_PLAY_POLICY } from "@/lib/field";
import { buildCase, type SeedContext } from "../../../scripts/seed/case-builder";
import { ARC_WEEKS, WATER_RUN } from "../../../scripts/seed/demo-groups";
import { planDemoCases } from "../../../scripts/seed/demo-plan";
import { captionText } from "../../../scripts/seed/demo-photos/caption-strip";
import { drawDemoPhoto, type DemoPhotoSpec } from "../../../scripts/seed/demo-photos/draw-photo";
import { partWords, planDemoPhotos, type PlanCase } from "../../../scripts/seed/demo-photos/photo-plan";
import { buildHistory } from "../../../scripts/seed/history";
import { createRng } from "../../../scripts/seed/prng";

const sha = (b: Buffer) => createHash("sha256").update(b).digest("hex");
const spec = (over: Partial<DemoPhotoSpec> = {}): DemoPhotoSpec => ({
  seed: 4242,
  caseNumber: "TL-25-00033",
  component: "cup",
  row: "outboard",
  damageCode: "fatigue.subsurface",
  zone: "raceway",
  severity: 3,
  view: "close",
  partWords: "cup, outboard",
  takenAt: new Date("2025-04-02T10:11:12Z"),
  ...over,
});

describe("drawDemoPhoto", () => {
  it("gives the same bytes for the same spec and other bytes for another seed", async () => {
    const [a, b, c] = await Promise.all([drawDemoPhoto(spec()), drawDemoPhoto(spec()), drawDemoPhoto(spec({ seed: 4243 }))]);
    expect(sha(a)).toBe(sha(b));
    expect(sha(c)).not.toBe(sha(a));
  });

  it("draws a different picture for each damage code on the same part and seed", async () => {
    const codes = [
      "none",
      "fatigue.subsurface",
      "corrosion.moisture",
      "electrical.arc",
      "electrical.fluting",
      "deformation.overload",
      "fatigue.surface",
    ];
    const images = await Promise.all(codes.map((damageCode) => drawDemoPhoto(spec({ damageCode }))));
    expect(new Set(images.map(sha)).size).toBe(codes.length);
    // Damage changes the pixels, not only the bytes: each differs visibly from the clean raceway.
    const raw = await Promise.all(images.map((i) => sharp(i).greyscale().raw().toBuffer()));
    for (let k = 1; k < raw.length; k++) {
      let changed = 0;
      for (let p = 0; p < raw[0].length; p++) if (Math.abs(raw[k][p] - raw[0][p]) > 40) changed++;
      expect(changed / raw[0].length, codes[k]).toBeGreaterThan(0.002); // common practice: a mark covering ≥ 0.2% of the frame is visible
    }
  });

  it("is a 1200×900 upright JPEG whose EXIF says when it was taken and that it is a demo", async () => {
    const jpg = await drawDemoPhoto(spec());
    expect([...jpg.subarray(0, 3)]).toEqual([0xff, 0xd8, 0xff]); // JPEG SOI marker (ITU-T T.81)
    const meta = await sharp(jpg).metadata();
    expect([meta.format, meta.width, meta.height]).toEqual(["jpeg", 1200, 900]); // demo photo size chosen for Tearline
    const exif = exifReader(meta.exif!);
    expect(exif.Image?.Orientation).toBe(1); // 1 = row 0 at the top, column 0 at the left (EXIF 2.32, CIPA DC-008)
    expect(String(exif.Image?.ImageDescription)).toContain("TEARLINE DEMO");
    expect(takenAtFromExif(meta.exif)?.toISOString()).toBe("2025-04-02T10:11:12.000Z");
  });

  it("carries the amber-hatched demo strip along the bottom, on every kind of part", async () => {
    const parts: Partial<DemoPhotoSpec>[] = [
      { component: "lubricant", row: null, damageCode: "lubricant.water", zone: "other", partWords: "grease" },
      { component: "seal-inboard", row: "inboard", damageCode: "seal.damaged", zone: "outside-surface", partWords: "seal, inboard" },
      { component: "rollers-inboard", row: "inboard", damageCode: "electrical.arc", zone: "roller-body", partWords: "rollers, inboard" },
      { component: "cap-screws", row: null, damageCode: "mounting.cap-screw", zone: "other", partWords: "cap screws" },
    ];
    for (const p of parts) {
      const { data, info } = await sharp(await drawDemoPhoto(spec(p)))
        .raw()
        .toBuffer({ resolveWithObject: true });
      const px = (x: number, y: number) => [
        ...data.subarray((y * info.width + x) * info.channels, (y * info.width + x) * info.channels + 3),
      ];
      // The strip's own colours: amber #f2a516 stripes in the hatch, near-black behind the words.
      let amber = 0;
      for (let y = 866; y < 898; y++) for (let x = 0; x < 28; x++) if (px(x, y)[0] > 190 && px(x, y)[2] < 90) amber++;
      expect(amber / (32 * 28)).toBeGreaterThan(0.3);
      expect(Math.max(...px(600, 866))).toBeLessThan(60);
    }
  });

  it("writes the case number and part in the strip", () => {
    expect(captionText("TL-25-00033", partWords({ component: "cup", row: "outboard" }))).toBe(
      "TEARLINE DEMO · TL-25-00033 · CUP, OUTBOARD",
    );
    expect(partWords({ component: "lubricant", row: null })).toBe("grease");
    expect(partWords({ component: "rollers-inboard", row: "inboard" })).toBe("rollers, inboard");
  });
});

describe("planDemoPhotos on the generated casebook", () => {
  // The demo casebook as the seed builds it, numbered in removal order, with findings dated by their history.
  const policy = { ...DEFAULT_END_PLAY_POLICY };
  const ctx: SeedContext = {
    sites: { MJC: { id: "site-mjc", policy }, PYC: { id: "site-pyc", policy }, OSW: { id: "site-osw", policy } },
    labId: "site-cfl",
    filer: { MJC: "u-insp", PYC: "u-insp2", OSW: "u-analyst" },
    analyst: "u-analyst",
    engineer: "u-engineer",
  };
  const rng = createRng(20261130);
  const { specs } = planDemoCases(rng);
  const seq = new Map<string, number>();
  let benchSeen = 0;
  const casebook: (PlanCase & { site: string; trigger: string })[] = specs.map((s) => {
    const c = buildCase(rng, s, ctx, s.status !== "bench" || benchSeen++ % 2 === 0);
    buildHistory(rng, s, c, ctx);
    const yy = s.removedOn.slice(2, 4);
    seq.set(yy, (seq.get(yy) ?? 0) + 1);
    return {
      id: c.values.id,
      number: `TL-${yy}-${String(seq.get(yy)).padStart(5, "0")}`,
      status: c.values.status!,
      removedOn: s.removedOn,
      site: s.site,
      trigger: s.trigger,
      findings: c.findings.map((f, i) => ({ ...f, id: `${c.values.id}-f${i}`, createdAt: f.createdAt! })),
    };
  });
  const plan = planDemoPhotos(casebook);
  const perCase = new Map<string, number>();
  for (const p of plan) perCase.set(p.caseId, (perCase.get(p.caseId) ?? 0) + 1);
  const byId = new Map(casebook.map((c) => [c.id, c]));

  it("photographs about 25 cases past the field stage, two to four photos each", () => {
    expect(perCase.size).toBeGreaterThanOrEqual(20); // demo scenario: about 25 cases
    expect(plan.length).toBeGreaterThanOrEqual(50); // demo scenario: enough photos for the gallery and comparisons
    for (const [id, n] of perCase) {
      expect(byId.get(id)!.status).not.toBe("field");
      expect(n).toBeGreaterThanOrEqual(2);
      expect(n).toBeLessThanOrEqual(4);
    }
  });

  it("tags each photo with a finding of its own case, its part, row and clock position", () => {
    for (const p of plan) {
      const f = byId.get(p.caseId)!.findings.find((x) => x.id === p.tags.findingId);
      expect(f, p.fileName).toBeDefined();
      expect([p.tags.component, p.tags.row, p.tags.clockDeg]).toEqual([f!.component, f!.row, f!.clockDeg]);
      expect(p.spec.damageCode).toBe(f!.damageCode);
      expect(p.takenAt.getTime()).toBeLessThan(p.uploadedAt.getTime());
      expect(p.tags.caption.length).toBeGreaterThan(20);
    }
    expect(new Set(plan.map((p) => `${p.caseId}/${p.fileName}`)).size).toBe(plan.length);
  });

  it("covers the arc-burn cluster, the water-etch run and spalls with cup photos to compare", () => {
    const leadCases = (code: string, pred: (c: (typeof casebook)[number]) => boolean = () => true) =>
      [...perCase.keys()]
        .map((id) => byId.get(id)!)
        .filter((c) => pred(c) && plan.some((p) => p.caseId === c.id && p.spec.damageCode === code && p.tags.component === "cup"));
    const inside = (w: readonly [string, string]) => (c: { removedOn: string | null }) => c.removedOn! >= w[0] && c.removedOn! <= w[1];
    // The arc cluster: Marrow Junction welding removals in the weeks after the track 4 work (demo scenario).
    expect(leadCases("electrical.arc", (c) => c.site === "MJC" && inside(ARC_WEEKS)(c)).length).toBeGreaterThanOrEqual(4);
    expect(leadCases("corrosion.moisture", inside(WATER_RUN)).length).toBeGreaterThanOrEqual(4); // demo scenario: spring 2025 water run
    expect(leadCases("fatigue.subsurface").length).toBeGreaterThanOrEqual(3);
  });
});
