import type { ComponentProps, ReactNode } from "react";

export const inputClass =
  "w-full h-11 sm:h-10 rounded-lg border border-line-strong bg-surface px-3 text-[15px] sm:text-sm text-ink placeholder:text-muted focus:outline-2 focus:outline-accent focus:border-transparent aria-[invalid=true]:border-danger";

export function Field({ label, hint, error, children, htmlFor }: { label: string; hint?: ReactNode; error?: string; children: ReactNode; htmlFor?: string }) {
  return (
    <div className="flex flex-col gap-1.5">
      <label htmlFor={htmlFor} className="text-sm font-medium text-ink-2">
        {label}
      </label>
      {children}
      {error ? (
        <p className="text-sm text-danger" role="alert">
          {error}
        </p>
      ) : hint ? (
        <p className="text-xs text-muted">{hint}</p>
      ) : null}
    </div>
  );
}

export function Input({ className = "", ...props }: ComponentProps<"input">) {
  return <input {...props} className={`${inputClass} ${className}`} />;
}

export function Select({ className = "", ...props }: ComponentProps<"select">) {
  return <select {...props} className={`${inputClass} pr-8 ${className}`} />;
}

export function Textarea({ className = "", ...props }: ComponentProps<"textarea">) {
  return <textarea {...props} className={`${inputClass} h-auto min-h-24 py-2 ${className}`} />;
}
