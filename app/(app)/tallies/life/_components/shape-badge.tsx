// The Weibull shape in words: early life, random, or wear-out.
import type { ShapeReading } from "@/lib/stats";

const LOOK: Record<ShapeReading, { label: string; className: string }> = {
  "early-life": { label: "Early life", className: "bg-danger-soft text-danger" },
  random: { label: "Random", className: "bg-stage-field-soft text-stage-field" },
  "wear-out": { label: "Wear-out", className: "bg-ok-soft text-ok" },
};

export function ShapeBadge({ reading }: { reading: ShapeReading }) {
  const look = LOOK[reading];
  return (
    <span
      className={`inline-flex shrink-0 items-center whitespace-nowrap rounded-full px-2 py-0.5 text-xs font-semibold ${look.className}`}
    >
      {look.label}
    </span>
  );
}

export const SHAPE_GUIDE = [
  {
    reading: "early-life" as const,
    text: "Shape below 1: failures come early and the rate falls with age — look at manufacture, reconditioning and mounting.",
  },
  {
    reading: "random" as const,
    text: "Shape near 1: failures arrive at a steady rate whatever the age — outside causes such as impact, water or welding.",
  },
  { reading: "wear-out" as const, text: "Shape above 1: the rate rises with age — fatigue and wear; a B10 life helps plan replacement." },
];
