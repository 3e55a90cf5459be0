import { ComparisonPage } from "../features/comparison/components/ComparisonPage";
import { ProjectPage } from "../features/projects/components/ProjectPage";
import { RecordReportPage } from "../features/records/components/RecordReportPage";
import { ReviewStatus } from "../features/records/components/ReviewStatus";
import { ReportView } from "../features/report/components/ReportView";

// The project and comparison pages carry the review status (features/records) below their
// header. Features do not import each other, so the app puts the two together here; the router
// loads this module lazily, so each page stays in its own chunk.

/** The project page with its review status. */
export function ProjectPageWithReview() {
  return <ProjectPage review={<ReviewStatus />} />;
}

/** The comparison page with its review status. */
export function ComparisonPageWithReview() {
  return <ComparisonPage review={<ReviewStatus />} />;
}

/** A frozen record's print page, drawn by the report's HTML view. */
export function RecordReportPageWithView() {
  return <RecordReportPage report={(content, meta) => <ReportView content={content} meta={meta} />} />;
}
