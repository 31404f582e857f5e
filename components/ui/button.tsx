import Link from "next/link";
import type { ComponentProps } from "react";

const variants = {
  primary: "bg-accent text-accent-ink hover:brightness-110 shadow-sm",
  secondary: "bg-surface text-ink border border-line-strong hover:bg-surface-2",
  ghost: "text-ink-2 hover:bg-surface-2",
  danger: "bg-danger text-white hover:brightness-110",
} as const;
// Touch targets are at least 44 px on phones (gloved hands); desks get the compact sizes.
const sizes = { sm: "h-11 px-3 text-sm lg:h-8", md: "h-11 px-4 text-sm lg:h-10", lg: "h-12 px-5 text-base" } as const;

type Style = { variant?: keyof typeof variants; size?: keyof typeof sizes };

export function buttonClass({ variant = "primary", size = "md" }: Style = {}, extra = "") {
  return `inline-flex items-center justify-center gap-2 rounded-lg font-medium transition focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-accent disabled:opacity-50 disabled:pointer-events-none ${variants[variant]} ${sizes[size]} ${extra}`;
}

export function Button({ variant, size, className = "", ...props }: ComponentProps<"button"> & Style) {
  return <button type="button" {...props} className={buttonClass({ variant, size }, className)} />;
}

export function ButtonLink({ variant, size, className = "", ...props }: ComponentProps<typeof Link> & Style) {
  return <Link {...props} className={buttonClass({ variant, size }, className)} />;
}
