"use client";
// Glove-sized single-choice chips (a radio group; every target at least 44 px), used across the removal form.
type Option<T extends string> = { value: T; label: string; tone?: "ok" | "warn" | "danger" };

const toneActive = {
  ok: "bg-ok text-white border-ok",
  warn: "bg-warn text-white border-warn",
  danger: "bg-danger text-white border-danger",
};

export function ChoiceChips<T extends string>({
  options,
  value,
  onChange,
  label,
  size = "md",
}: {
  options: Option<T>[];
  value: T | null | undefined;
  onChange: (v: T) => void;
  label: string;
  size?: "sm" | "md";
}) {
  return (
    <div role="radiogroup" aria-label={label} className="flex flex-wrap gap-2">
      {options.map((o) => {
        const active = value === o.value;
        return (
          <button
            key={o.value}
            type="button"
            role="radio"
            aria-checked={active}
            onClick={() => onChange(o.value)}
            className={`rounded-lg border font-medium transition ${size === "sm" ? "min-h-11 min-w-11 px-3 text-sm" : "min-h-12 min-w-12 px-4 text-base"} ${
              active
                ? o.tone
                  ? toneActive[o.tone]
                  : "border-accent bg-accent text-accent-ink"
                : "border-line-strong bg-surface text-ink-2 hover:border-accent"
            }`}
          >
            {o.label}
          </button>
        );
      })}
    </div>
  );
}
