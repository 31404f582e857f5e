// The mix of removals for the large generator: how often each trigger occurs and what teardown
// then tends to find. Invented, but shaped like a freight fleet's casebook (common practice,
// estimated): hand roll and wayside alarms lead; about 40% of hot-bearing alarms show no defect.
import type { RootCauseCode, TriggerCode } from "../../lib/classification";

type Mix<T> = readonly (readonly [T, number])[];

export const TRIGGER_MIX: Mix<TriggerCode> = [
  ["hand-roll", 24],
  ["wayside-hot", 16],
  ["wheel-removal", 10],
  ["end-play-high", 8],
  ["seal-grease", 7],
  ["wayside-acoustic", 6],
  ["scheduled", 6],
  ["visual-other", 5],
  ["cap-screws", 4],
  ["backing-ring", 3],
  ["welding", 3],
  ["accident", 2],
  ["end-play-tight", 2],
  ["other", 2],
];

export const CAUSE_BY_TRIGGER: Record<TriggerCode, Mix<RootCauseCode>> = {
  "wayside-hot": [
    ["no-defect", 40],
    ["end-of-life", 15],
    ["lubrication", 14],
    ["water-ingress", 8],
    ["seal", 6],
    ["debris-ingress", 6],
    ["material", 4],
    ["undetermined", 5],
    ["impact", 2],
  ],
  "wayside-acoustic": [
    ["end-of-life", 30],
    ["no-defect", 20],
    ["debris-ingress", 12],
    ["material", 10],
    ["water-ingress", 8],
    ["electrical", 6],
    ["impact", 6],
    ["undetermined", 8],
  ],
  "hand-roll": [
    ["no-defect", 22],
    ["end-of-life", 22],
    ["debris-ingress", 18],
    ["water-ingress", 12],
    ["lubrication", 6],
    ["material", 5],
    ["reconditioning", 5],
    ["handling", 4],
    ["electrical", 2],
    ["undetermined", 4],
  ],
  "end-play-high": [
    ["end-of-life", 45],
    ["debris-ingress", 20],
    ["reconditioning", 12],
    ["mounting", 10],
    ["no-defect", 8],
    ["undetermined", 5],
  ],
  "end-play-tight": [
    ["lubrication", 35],
    ["mounting", 25],
    ["reconditioning", 20],
    ["material", 10],
    ["undetermined", 10],
  ],
  "seal-grease": [
    ["seal", 55],
    ["water-ingress", 20],
    ["lubrication", 10],
    ["no-defect", 10],
    ["undetermined", 5],
  ],
  welding: [
    ["electrical", 85],
    ["no-defect", 15],
  ],
  "cap-screws": [
    ["mounting", 80],
    ["reconditioning", 15],
    ["no-defect", 5],
  ],
  "backing-ring": [
    ["mounting", 75],
    ["reconditioning", 20],
    ["no-defect", 5],
  ],
  "wheel-removal": [
    ["no-defect", 45],
    ["impact", 25],
    ["end-of-life", 12],
    ["handling", 8],
    ["undetermined", 5],
    ["debris-ingress", 5],
  ],
  accident: [
    ["impact", 70],
    ["handling", 10],
    ["no-defect", 10],
    ["undetermined", 10],
  ],
  "visual-other": [
    ["water-ingress", 30],
    ["lubrication", 25],
    ["material", 15],
    ["seal", 15],
    ["undetermined", 10],
    ["electrical", 5],
  ],
  scheduled: [
    ["no-defect", 45],
    ["end-of-life", 30],
    ["handling", 10],
    ["material", 5],
    ["debris-ingress", 10],
  ],
  other: [
    ["undetermined", 35],
    ["handling", 30],
    ["no-defect", 35],
  ],
};

export const SITE_MIX = [
  ["MJC", 45],
  ["PYC", 35],
  ["OSW", 20],
] as const;
export const WHEEL_SHOP_MIX = [
  ["OSW", 55],
  ["MJC", 25],
  ["PYC", 20],
] as const;
