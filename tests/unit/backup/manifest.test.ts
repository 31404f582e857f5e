import { describe, expect, it } from "vitest";
import { compareObjects, compareTables, parseManifest, safeObjectPath, sha256 } from "@/lib/backup/manifest";

describe("backup manifest", () => {
  it("hashes with SHA-256", () => {
    // FIPS 180-2, appendix B.1: SHA-256("abc")
    expect(sha256("abc")).toBe("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
  });

  it("names every table whose count differs, is missing or is extra", () => {
    expect(compareTables({ "public.cases": 3, "public.photos": 2 }, { "public.cases": 3, "public.photos": 2 })).toEqual([]);
    expect(compareTables({ "public.cases": 3, "public.photos": 2 }, { "public.cases": 2, "public.notes": 0 })).toEqual([
      "table public.cases has 2 rows, the backup 3",
      "table public.notes is not in the backup",
      "table public.photos is missing",
    ]);
  });

  it("names every object that is missing, changed or extra", () => {
    const a = { key: "p/a.jpg", bytes: 3, sha256: sha256("abc") };
    const b = { key: "p/b.jpg", bytes: 1, sha256: sha256("b") };
    expect(compareObjects([a, b], [b, a])).toEqual([]);
    expect(
      compareObjects(
        [a, b],
        [
          { ...a, sha256: sha256("abd") },
          { key: "p/c.jpg", bytes: 1, sha256: sha256("c") },
        ],
      ),
    ).toEqual(["object p/a.jpg differs from the backup", "object p/b.jpg is missing", "object p/c.jpg is not in the backup"]);
  });

  it("refuses object keys that would leave the backup folder", () => {
    expect(safeObjectPath("photos/2026/a.jpg")).toBe("photos/2026/a.jpg");
    for (const bad of ["../etc/passwd", "/abs", "a//b", "a/./b", ""]) expect(() => safeObjectPath(bad)).toThrow();
  });

  it("refuses a folder that is not a backup", () => {
    expect(() => parseManifest(JSON.stringify({ format: "other" }))).toThrow(/not a Tearline backup/);
  });
});
