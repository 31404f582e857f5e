// Messages shown to the mechanic beside a field check. Plain words, one finding each.

export type FieldMessageLevel = "remove" | "warn" | "info" | "error";

export type FieldMessage = {
  level: FieldMessageLevel;
  /** Stable machine code, e.g. "over-limit"; the text is what people read. */
  code: string;
  text: string;
};

export function message(level: FieldMessageLevel, code: string, text: string): FieldMessage {
  return { level, code, text };
}

export function hasLevel(messages: readonly FieldMessage[], level: FieldMessageLevel): boolean {
  return messages.some((m) => m.level === level);
}

/** "a", "a and b", "a, b and c" — for naming cells or trials in a sentence. */
export function listInWords(items: readonly string[]): string {
  if (items.length <= 1) return items.join("");
  return `${items.slice(0, -1).join(", ")} and ${items[items.length - 1]}`;
}
