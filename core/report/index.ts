/**
 * The calculation report of a record's content, as blocks the PDF renderer (api/) and the print page
 * (web/) both draw, so the two say the same. Pure TypeScript: no DOM, no Node.
 */
export type { ReportBlock, ReportColumn, ReportSection } from "./blocks";
export type { ReportMohr } from "./mohr-figure";
export type { ReportMeta, RevisionEntry, Signature } from "./meta";
export { DRAFT_WATERMARK } from "./meta";
export type { ReportModel } from "./model";
export { buildReportModel, RESPONSIBILITY } from "./model";
export { VERIFY_CERTIFICATE_NOTE } from "./inputs-section";
export { VERDICT_TEXT } from "./location-sections";
export { recordReportMeta } from "./record-meta";
export { scopeCoverageSentence } from "./coverage";
