// The one way the app imports zod (lint enforces it). In the browser zod is told not to compile its checks
// with new Function(): the content-security policy forbids eval, and even zod's probe for it is reported as
// a violation. Configured here, beside the import, so only pages that validate carry zod at all.
import { z } from "zod";

if (typeof window !== "undefined") z.config({ jitless: true });

export * from "zod";
