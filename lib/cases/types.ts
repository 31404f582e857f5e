// Row shapes the case screens draw, named here so pages and components (client ones too, with
// `import type`) never reach into db/. Types only: nothing here runs.
export type { CaseDetail } from "@/db/queries/case-read";
export type { CaseListOptions, FilterOption } from "@/db/queries/case-list-options";
export type { CaseLinkItem } from "@/db/queries/case-links";
export type { CaseCard } from "@/db/queries/home";
export type { SimilarCaseItem } from "./similar-service";
export type { Finding } from "@/db/schema";
