/** Tearline's mark: a bearing seen end-on, cut by the tear line. Our own drawing. */
export function BrandMark({ className = "h-7 w-7" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden>
      <circle cx="16" cy="16" r="14" fill="none" stroke="currentColor" strokeWidth="3" />
      <circle cx="16" cy="16" r="6" fill="none" stroke="currentColor" strokeWidth="3" />
      {[0, 60, 120, 180, 240, 300].map((a) => (
        <circle
          key={a}
          cx={16 + 10 * Math.sin((a * Math.PI) / 180)}
          cy={16 - 10 * Math.cos((a * Math.PI) / 180)}
          r="2"
          fill="currentColor"
        />
      ))}
      <path d="M3 25 L29 7" stroke="#f59e0b" strokeWidth="2.5" strokeLinecap="round" />
    </svg>
  );
}

export function BrandName() {
  return (
    <span className="flex items-center gap-2 font-semibold tracking-tight">
      <BrandMark />
      <span className="text-lg">Tearline</span>
    </span>
  );
}
