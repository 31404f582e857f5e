"use client";
// Zod compiles object checks with new Function() when it may; the content-security policy forbids
// eval, so the browser copy of zod is told not to try (the probe alone would report a violation).
import { z } from "zod";

z.config({ jitless: true });

export function ZodJitless() {
  return null;
}
