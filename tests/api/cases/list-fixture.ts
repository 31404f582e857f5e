// A small casebook for the case list tests: twelve cases that differ in every filtered column,
// marked with a run token in the serial so the tests see only these among the demo cases.
import { eq, inArray } from "drizzle-orm";
import { DEMO_USERS } from "../../../scripts/seed/demo-people";
import { db, t } from "../../support/db";
import { createCase, siteId, userId } from "../../support/factories";

export type Spec = {
  key: string;
  status: "field" | "bench" | "signoff" | "signed";
  trigger: string;
  cause: string | null;
  cls: string;
  site: "MJC" | "PYC" | "OSW" | null;
  removedOn: string | null;
  filer: "analyst" | "inspector" | "pellham";
  carNumber: string;
  endPlay: number | null;
  serial?: string;
};

// Every value invented for the test; each filter picks a different subset.
export const SPECS: Spec[] = [
  {
    key: "c1",
    status: "field",
    trigger: "wayside-hot",
    cause: null,
    cls: "F",
    site: "MJC",
    removedOn: "2026-01-10",
    filer: "analyst",
    carNumber: "88",
    endPlay: 0.012,
  },
  {
    key: "c2",
    status: "bench",
    trigger: "hand-roll",
    cause: null,
    cls: "G",
    site: "MJC",
    removedOn: "2026-02-14",
    filer: "analyst",
    carNumber: "9001",
    endPlay: 0.0305,
  },
  {
    key: "c3",
    status: "signoff",
    trigger: "wayside-hot",
    cause: "water-ingress",
    cls: "F",
    site: "PYC",
    removedOn: "2026-03-01",
    filer: "analyst",
    carNumber: "123456",
    endPlay: null,
  },
  {
    key: "c4",
    status: "signed",
    trigger: "seal-grease",
    cause: "seal",
    cls: "K",
    site: "PYC",
    removedOn: "2026-03-20",
    filer: "analyst",
    carNumber: "450",
    endPlay: 0.0712,
    serial: 'comma,"quoted"',
  },
  {
    key: "c5",
    status: "signed",
    trigger: "wayside-hot",
    cause: "no-defect",
    cls: "E",
    site: "OSW",
    removedOn: "2026-04-05",
    filer: "analyst",
    carNumber: "77001",
    endPlay: 0.009,
    serial: "=HYPERLINK(1)",
  },
  {
    key: "c6",
    status: "signed",
    trigger: "hand-roll",
    cause: "end-of-life",
    cls: "F",
    site: "MJC",
    removedOn: "2026-05-30",
    filer: "analyst",
    carNumber: "5",
    endPlay: 0.04,
  },
  {
    key: "c7",
    status: "signoff",
    trigger: "end-play-high",
    cause: "debris-ingress",
    cls: "other",
    site: "PYC",
    removedOn: "2026-06-15",
    filer: "analyst",
    carNumber: "31337",
    endPlay: 0.081,
  },
  {
    key: "c8",
    status: "field",
    trigger: "welding",
    cause: null,
    cls: "D",
    site: "PYC",
    removedOn: "2026-07-01",
    filer: "inspector",
    carNumber: "2020",
    endPlay: null,
  },
  {
    key: "c9",
    status: "bench",
    trigger: "wayside-hot",
    cause: null,
    cls: "F",
    site: "MJC",
    removedOn: "2026-08-08",
    filer: "pellham",
    carNumber: "640",
    endPlay: 0.02,
  },
  {
    key: "c10",
    status: "field",
    trigger: "scheduled",
    cause: null,
    cls: "F",
    site: null,
    removedOn: "2026-09-09",
    filer: "analyst",
    carNumber: "100",
    endPlay: 0.015,
  },
  {
    key: "c11",
    status: "signed",
    trigger: "wayside-hot",
    cause: "water-ingress",
    cls: "F",
    site: "OSW",
    removedOn: "2025-12-31",
    filer: "analyst",
    carNumber: "999999",
    endPlay: 0.0333,
  },
  {
    key: "c12",
    status: "field",
    trigger: "hand-roll",
    cause: null,
    cls: "G",
    site: "PYC",
    removedOn: null,
    filer: "analyst",
    carNumber: "7070",
    endPlay: null,
  },
];

export type Built = Spec & { id: string; number: string; createdBy: string; siteId: string | null; serialText: string };

export const TOKEN = `LQ${Math.random().toString(36).slice(2, 7).toUpperCase()}`;

async function pellhamId(): Promise<string> {
  const [u] = await db.select({ id: t.user.id }).from(t.user).where(eq(t.user.email, DEMO_USERS[1].email));
  return u.id;
}

export async function buildCasebook(): Promise<Built[]> {
  const filers = { analyst: await userId("analyst"), inspector: await userId("inspector"), pellham: await pellhamId() };
  const sites = { MJC: await siteId("MJC"), PYC: await siteId("PYC"), OSW: await siteId("OSW") };
  const out: Built[] = [];
  for (const s of SPECS) {
    const serialText = s.serial ? `${s.serial.startsWith("=") ? "=" : ""}${TOKEN}-${s.serial.replace(/^=/, "")}` : `${TOKEN}-${s.key}`;
    const row = await createCase({
      status: s.status,
      trigger: s.trigger,
      primaryCause: s.cause,
      bearingClass: s.cls,
      bearingClassOther: s.cls === "other" ? "AP-X, compact" : null,
      siteId: s.site ? sites[s.site] : null,
      removedOn: s.removedOn,
      createdBy: filers[s.filer],
      carMark: "LSTX",
      carNumber: s.carNumber,
      serial: serialText,
      endPlayMeanIn: s.endPlay,
      removalConfirmed: s.cause === "no-defect" ? "no-defect" : s.cause ? "confirmed" : null,
    });
    out.push({ ...s, id: row.id, number: row.number, createdBy: filers[s.filer], siteId: row.siteId, serialText });
  }
  return out;
}

export async function removeCasebook(built: Built[]) {
  if (built.length)
    await db.delete(t.cases).where(
      inArray(
        t.cases.id,
        built.map((b) => b.id),
      ),
    );
}
