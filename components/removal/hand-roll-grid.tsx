"use client";
// The hand-roll grid: 3 axle positions × cup pulled/pushed, each cell a feel and its revolutions.
import { AXLE_POSITIONS, ROLL_DIRECTIONS, evaluateHandRoll, type HandRollGrid } from "@/lib/field";
import type { FieldChecks } from "@/lib/cases/schemas";
import { ChoiceChips } from "./choice-chips";
import { FieldMessages } from "./field-messages";

type HandRoll = NonNullable<FieldChecks["handRoll"]>;
type Feel = "smooth" | "stiff" | "rough" | "catch";
const FEELS: { value: Feel; label: string; tone?: "ok" | "warn" | "danger" }[] = [
  { value: "smooth", label: "Smooth", tone: "ok" },
  { value: "stiff", label: "Stiff only", tone: "warn" },
  { value: "rough", label: "Rough", tone: "danger" },
  { value: "catch", label: "Catch", tone: "danger" },
];
const DIRECTION_LABEL = { pull: "Cup pulled outboard", push: "Cup pushed inboard" };

export function HandRollEntry({ value, onChange, readOnly }: { value: HandRoll; onChange: (v: HandRoll) => void; readOnly?: boolean }) {
  const grid = value.grid as Record<string, Record<string, { feel: Feel | null; revolutions?: number }>>;
  const setCell = (pos: number, dir: string, cell: { feel?: Feel | null; revolutions?: number | undefined }) => {
    // Revolutions start empty: two full turns are confirmed by entering them, never assumed.
    const prev = grid[pos]?.[dir] ?? { feel: null };
    onChange({ ...value, grid: { ...value.grid, [pos]: { ...grid[pos], [dir]: { ...prev, ...cell } } } });
  };
  const proc = value.procedure;
  const evaluation = evaluateHandRoll(value.grid as HandRollGrid, proc);
  return (
    <fieldset disabled={readOnly} className="flex flex-col gap-4">
      <div className="grid gap-3 sm:grid-cols-3">
        <div>
          <p className="mb-1.5 text-xs font-medium text-muted">Turned by</p>
          <ChoiceChips
            label="Turned by"
            size="sm"
            value={proc.turnedBy}
            onChange={(v) => onChange({ ...value, procedure: { ...proc, turnedBy: v } })}
            options={[
              { value: "hand", label: "Hand" },
              { value: "foot", label: "Foot", tone: "danger" },
            ]}
          />
        </div>
        <div>
          <p className="mb-1.5 text-xs font-medium text-muted">Direction</p>
          <ChoiceChips
            label="Direction"
            size="sm"
            value={proc.oneDirection === undefined ? undefined : proc.oneDirection ? "one" : "osc"}
            onChange={(v) => onChange({ ...value, procedure: { ...proc, oneDirection: v === "one" } })}
            options={[
              { value: "one", label: "One direction" },
              { value: "osc", label: "Back and forth", tone: "danger" },
            ]}
          />
        </div>
        <div>
          <p className="mb-1.5 text-xs font-medium text-muted">Judged by</p>
          <ChoiceChips
            label="Judged by"
            size="sm"
            value={proc.judgedBy}
            onChange={(v) => onChange({ ...value, procedure: { ...proc, judgedBy: v } })}
            options={[
              { value: "feel", label: "Feel" },
              { value: "ear", label: "Ear", tone: "danger" },
            ]}
          />
        </div>
      </div>
      <div className="grid gap-3 md:grid-cols-3">
        {AXLE_POSITIONS.map((pos) => (
          <div key={pos} className="rounded-lg border border-line bg-surface-2 p-3">
            <p className="mb-2 text-sm font-semibold">Axle turned to {pos}°</p>
            {ROLL_DIRECTIONS.map((dir) => {
              const cell = grid[pos]?.[dir];
              return (
                <div key={dir} className="mb-3 last:mb-0" data-cell={`${pos}-${dir}`}>
                  <p className="mb-1 text-xs text-muted">{DIRECTION_LABEL[dir]}</p>
                  <ChoiceChips
                    label={`${pos}° ${dir}`}
                    size="sm"
                    options={FEELS}
                    value={cell?.feel ?? null}
                    onChange={(feel) => setCell(pos, dir, { feel })}
                  />
                  <label className="mt-2 flex items-center gap-2 text-sm text-muted">
                    Full revolutions
                    <input
                      type="number"
                      min={0}
                      max={20}
                      inputMode="numeric"
                      aria-label={`${pos}° ${dir} revolutions`}
                      placeholder="2"
                      className="h-11 w-16 rounded-lg border border-line-strong bg-surface px-2 text-base text-ink placeholder:text-muted/50"
                      value={cell?.revolutions ?? ""}
                      onChange={(e) => setCell(pos, dir, { revolutions: e.target.value === "" ? undefined : Number(e.target.value) })}
                    />
                  </label>
                </div>
              );
            })}
          </div>
        ))}
      </div>
      <FieldMessages messages={evaluation.messages} />
    </fieldset>
  );
}
