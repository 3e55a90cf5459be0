import { useEffect, useMemo } from "react";
import type { RecordContent } from "../../../../../core/contract/records";
import { buildReportModel, type ReportMeta } from "../../../../../core/report";
import { Caution } from "../../../components/Caution";
import { pageRuleCss } from "../model/cells";
import { ReportBlockView } from "./ReportBlocks";
import "./report-print.css";

/**
 * Adds the printed pages' running footer (the identifier, "page n of m") while the report is shown.
 * Through the CSSOM, because the app's Content-Security-Policy refuses inline <style> elements, and
 * a stylesheet file cannot carry the identifier.
 */
function usePageRule(pageIdentifier: string): void {
  useEffect(() => {
    const sheet = new CSSStyleSheet();
    sheet.replaceSync(pageRuleCss(pageIdentifier));
    document.adoptedStyleSheets = [...document.adoptedStyleSheets, sheet];
    return () => {
      document.adoptedStyleSheets = document.adoptedStyleSheets.filter((s) => s !== sheet);
    };
  }, [pageIdentifier]);
}

/**
 * The calculation report of a record's content, the same model the PDF draws (core/report), as a
 * page made to be printed: each location starts a new printed page, every printed page names the
 * record (or the draft) and "page n of m", and a draft carries its watermark on every page. The
 * records pages reuse it for a frozen record's report.
 */
export function ReportView({ content, meta }: { content: RecordContent; meta: ReportMeta }) {
  const model = useMemo(() => buildReportModel(content, meta), [content, meta]);
  usePageRule(model.pageIdentifier);
  return (
    <article data-report className="report mx-auto max-w-4xl bg-panel px-6 py-6 print:max-w-none print:p-0">
      {model.watermark && (
        <div aria-hidden="true" className="report-watermark" data-testid="report-watermark">
          {model.watermark}
        </div>
      )}
      <p className="mb-4 text-sm text-graphite-soft">
        <span className="num">{model.pageIdentifier}</span>
      </p>
      <Caution className="mb-4" />
      {model.sections.map((section) => (
        <section
          key={section.id}
          id={`report-${section.id}`}
          data-testid={`report-section-${section.id}`}
          className={`mb-8 ${section.pageBreakBefore ? "report-page-break" : ""}`}
        >
          <h2 className="mb-2 break-after-avoid border-b border-ink pb-1 text-2xl font-semibold tracking-tight text-ink">
            {section.title}
          </h2>
          {section.blocks.map((block, i) => (
            <ReportBlockView key={i} block={block} />
          ))}
        </section>
      ))}
    </article>
  );
}
