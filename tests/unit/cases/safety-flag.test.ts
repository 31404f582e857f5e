import { describe, expect, it } from "vitest";
import { safetyFlagOf } from "@/lib/cases/safety-flag";

// Which confirmations apply: blue signal, wheelset out and secured, protective equipment always; a cooled bearing
// only after a hot-bearing alarm (common practice before handling a journal bearing).
describe("safety flag of a case", () => {
  it("names each confirmation left unticked, with its caution", () => {
    const flag = safetyFlagOf({ confirmations: { ppe: true, blueSignal: true } }, "wayside-hot");
    expect(flag.map((f) => f.key)).toEqual(["wheelsetSecured", "cooled"]);
    expect(flag[0].text).toMatch(/^wheelset is out from under the car and secured against rolling — /);
  });

  it("is empty when every confirmation that applies was ticked", () => {
    expect(safetyFlagOf({ confirmations: { ppe: true, blueSignal: true, wheelsetSecured: true } }, "hand-roll")).toEqual([]);
  });

  it("asks about cooling only after a hot-bearing alarm", () => {
    expect(
      safetyFlagOf({ confirmations: { ppe: true, blueSignal: true, wheelsetSecured: true } }, "wayside-hot").map((f) => f.key),
    ).toEqual(["cooled"]);
  });

  it("is empty before a field report exists", () => {
    expect(safetyFlagOf(null, null)).toEqual([]);
    expect(safetyFlagOf({}, null)).toEqual([]);
  });
});
