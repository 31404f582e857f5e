// A low-key button for actions that take something away (suspend, withdraw, retire, delete).
export const quietDangerClass =
  "inline-flex h-8 items-center justify-center rounded-lg px-3 text-sm font-medium text-danger transition hover:bg-danger-soft focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-accent disabled:pointer-events-none disabled:opacity-50";
