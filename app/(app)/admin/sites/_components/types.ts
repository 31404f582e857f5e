// The site as the Sites page hands it to its client pieces.
import type { SiteKind } from "@/lib/validation/site";

export type SiteView = {
  id: string;
  code: string;
  name: string;
  kind: SiteKind;
  railway: string;
  location: string;
  active: boolean;
  endPlayMaxIn: number;
  dialSpreadIn: number;
  tapeSpreadIn: number;
  plausibleMaxIn: number;
  /** What one removal costs here, USD; null when not set. */
  removalCostUsd: number | null;
  usage: { cases: number; users: number };
};

export type PolicyKey = "endPlayMaxIn" | "dialSpreadIn" | "tapeSpreadIn" | "plausibleMaxIn";
