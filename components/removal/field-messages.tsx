import type { FieldMessage } from "@/lib/field";

const style: Record<FieldMessage["level"], string> = {
  remove: "border-danger/40 bg-danger-soft text-danger",
  error: "border-danger/40 bg-danger-soft text-danger",
  warn: "border-warn/40 bg-warn-soft text-ink-2",
  info: "border-line bg-surface-2 text-ink-2",
};
const mark: Record<FieldMessage["level"], string> = { remove: "Remove", error: "Fix", warn: "Check", info: "Note" };

export function FieldMessages({ messages }: { messages: readonly FieldMessage[] }) {
  if (!messages.length) return null;
  return (
    <ul className="flex flex-col gap-1.5">
      {messages.map((m, i) => (
        <li key={`${m.code}-${i}`} className={`rounded-md border px-3 py-2 text-sm ${style[m.level]}`}>
          <span className="mr-1.5 text-[11px] font-bold uppercase tracking-wide">{mark[m.level]}</span>
          {m.text}
        </li>
      ))}
    </ul>
  );
}
