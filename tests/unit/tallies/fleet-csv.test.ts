import { describe, expect, it } from "vitest";
import { FLEET_TEMPLATE, parseFleetCsv } from "@/lib/tallies/fleet-csv";

describe("fleet list upload", () => {
  it("reads the template, deriving months from the mounting date when none are given", () => {
    const r = parseFleetCsv(FLEET_TEMPLATE);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.rows).toHaveLength(2);
    // 2019-04-10 to 2026-03-31 is 2547 days; / 30.436875 days per mean month = 83.68 (Gregorian calendar arithmetic)
    const days = (Date.UTC(2026, 2, 31) - Date.UTC(2019, 3, 10)) / 86_400_000;
    expect(days).toBe(2547);
    expect(r.rows[0]).toEqual({
      serial: "SRX40001",
      bearingClass: "F",
      mountedOn: "2019-04-10",
      asOf: "2026-03-31",
      serviceMonths: Math.round((days / 30.436875) * 100) / 100,
      serviceMiles: null,
    });
    expect(r.rows[1]).toMatchObject({ serial: "SRX40002", serviceMonths: 58.5, serviceMiles: 402000, mountedOn: null });
  });

  it("accepts headers in any case and spacing, and skips blank lines", () => {
    const r = parseFleetCsv("Serial, Bearing Class ,AS-OF,Service Months\n\nA1,F,2026-01-31,12\n");
    expect(r).toEqual({
      ok: true,
      rows: [{ serial: "A1", bearingClass: "F", mountedOn: null, asOf: "2026-01-31", serviceMonths: 12, serviceMiles: null }],
    });
  });

  it("numbers each error by the row the user sees in a spreadsheet and stores nothing", () => {
    const csv = [
      "serial,bearing_class,mounted_on,as_of,service_months,service_miles",
      "A1,F,,2026-01-31,12,",
      "A2,F,,2026-02-30,12,",
      "",
      "A3,,,2026-01-31,-4,",
      "A4,G,2026-03-01,2026-01-31,,",
      "A5,G,,2026-01-31,,",
      "A6,G,,2026-01-31,,12.5",
      "A7,G,,31/01/2026,3,",
    ].join("\n");
    const r = parseFleetCsv(csv);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors).toEqual([
      { row: 3, column: "as_of", message: "not a real calendar date" },
      { row: 5, column: "bearing_class", message: "bearing_class is empty" },
      { row: 5, column: "service_months", message: "service_months cannot be negative" },
      { row: 6, column: "mounted_on", message: "mounted_on is after as_of" },
      { row: 7, column: "service_months", message: "give service_months, service_miles or mounted_on" },
      { row: 8, column: "service_miles", message: "service_miles must be a whole number" },
      { row: 9, column: "as_of", message: "write the date as YYYY-MM-DD" },
    ]);
    expect(r.errorCount).toBe(7);
  });

  it("counts a quoted field with a line break as one row", () => {
    const r = parseFleetCsv('serial,bearing_class,as_of,service_months\n"A\n1",F,2026-01-31,5\nA2,F,2026-01-31,x\n');
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors[0]).toMatchObject({ row: 4, column: "service_months" });
  });

  it("refuses a file without the required columns or without units", () => {
    const noAsOf = parseFleetCsv("serial,bearing_class\nA1,F\n");
    expect(noAsOf.ok === false && noAsOf.errors[0].message).toMatch(/lacks as_of/);
    const empty = parseFleetCsv("serial,bearing_class,as_of\n");
    expect(empty.ok === false && empty.errors[0].message).toMatch(/no units/);
  });
});
