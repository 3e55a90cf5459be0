import type { ReportBlock } from "../../../../../core/report";
import { verdictOfCell } from "../model/cells";
import { MohrFigure } from "./MohrFigure";

const VERDICT_CLASS = { pass: "text-pass", close: "text-close", fail: "text-fail" } as const;

function Table({ block }: { block: Extract<ReportBlock, { kind: "table" }> }) {
  if (block.rows.length === 0)
    return block.empty ? <p className="text-sm text-graphite-soft">{block.empty}</p> : null;
  const total = block.columns.reduce((s, c) => s + c.width, 0);
  return (
    <table className="my-2 w-full table-fixed border-collapse text-[13px]">
      <colgroup>
        {block.columns.map((c, i) => (
          <col key={i} style={{ width: `${(100 * c.width) / total}%` }} />
        ))}
      </colgroup>
      <thead>
        <tr className="border-b border-rule-strong">
          {block.columns.map((c, i) => (
            <th
              key={i}
              scope="col"
              className={`px-1.5 py-1 font-semibold text-graphite-soft ${c.align === "right" ? "text-right" : "text-left"}`}
            >
              {c.title}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {block.rows.map((row, r) => (
          <tr key={r} className="break-inside-avoid border-b border-rule">
            {row.map((cell, i) => {
              const verdict = verdictOfCell(cell);
              const right = block.columns[i]?.align === "right";
              return (
                <td
                  key={i}
                  className={`px-1.5 py-1 align-top break-words ${right ? "num text-right" : ""} ${verdict ? `font-semibold ${VERDICT_CLASS[verdict]}` : ""}`}
                >
                  {cell}
                </td>
              );
            })}
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** One block of the report, drawn as the PDF draws it (core/report decides what it says). */
export function ReportBlockView({ block }: { block: ReportBlock }) {
  switch (block.kind) {
    case "heading":
      return <h3 className="mt-4 break-after-avoid text-base font-semibold">{block.text}</h3>;
    case "paragraph":
      return (
        <p
          className={
            block.tone === "caution"
              ? "my-1 font-semibold text-close"
              : block.tone === "note"
                ? "my-1 text-sm text-graphite-soft"
                : "my-1"
          }
        >
          {block.text}
        </p>
      );
    case "fields":
      return (
        // On a phone each label stands above its value, so dates and words keep whole; only an
        // unbroken run such as a hash or an id wraps inside itself (overflow-wrap: anywhere).
        <dl className="my-2 grid grid-cols-1 gap-x-4 gap-y-0.5 text-[14px] sm:grid-cols-[minmax(10rem,30%)_1fr]">
          {block.rows.map(([label, value]) => (
            <div key={label} className="contents">
              <dt className="text-graphite-soft">{label}</dt>
              <dd className="num mb-1.5 [overflow-wrap:anywhere] sm:mb-0">{value}</dd>
            </div>
          ))}
        </dl>
      );
    case "table":
      return <Table block={block} />;
    case "formulas":
      return (
        <div className="my-1 pl-3">
          {block.lines.map((line) => (
            <p key={line} className="num text-ink">
              {line}
            </p>
          ))}
          <p className="text-sm text-graphite-soft">Source: {block.source}.</p>
        </div>
      );
    case "list":
      return (
        <ul className="my-1 list-disc pl-5">
          {block.items.map((item) => (
            <li key={item}>{item}</li>
          ))}
        </ul>
      );
    case "mohr":
      return <MohrFigure figure={block.figure} caption={block.caption} />;
  }
}
