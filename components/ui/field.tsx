import { Children, cloneElement, isValidElement, type ComponentProps, type ReactElement, type ReactNode } from "react";

export const inputClass =
  "w-full h-11 sm:h-10 rounded-lg border border-line-strong bg-surface px-3 text-[15px] sm:text-sm text-ink placeholder:text-muted focus:outline-2 focus:outline-accent focus:border-transparent aria-[invalid=true]:border-2 aria-[invalid=true]:border-danger aria-[invalid=true]:bg-danger-soft/40";

export function Field({
  label,
  hint,
  error,
  children,
  htmlFor,
}: {
  label: string;
  hint?: ReactNode;
  error?: string;
  children: ReactNode;
  htmlFor?: string;
}) {
  return (
    <div className="flex flex-col gap-1.5">
      <label htmlFor={htmlFor} className="text-sm font-medium text-ink-2">
        {label}
      </label>
      {error ? outlined(children, htmlFor) : children}
      {error ? (
        <p id={htmlFor ? `${htmlFor}-error` : undefined} className="text-sm font-medium text-danger">
          {error}
        </p>
      ) : hint ? (
        <p className="text-xs text-muted">{hint}</p>
      ) : null}
    </div>
  );
}

/** A field with a problem is outlined and described by its message (the one control child gets aria-invalid). */
function outlined(children: ReactNode, htmlFor?: string) {
  if (Children.count(children) !== 1 || !isValidElement(children)) return children;
  const child = children as ReactElement<{ "aria-invalid"?: boolean; "aria-describedby"?: string }>;
  return cloneElement(child, { "aria-invalid": true, "aria-describedby": htmlFor ? `${htmlFor}-error` : child.props["aria-describedby"] });
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
