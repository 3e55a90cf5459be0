import type { ReactNode } from "react";

/** The formulas a calculator used, each line as written on a calculation sheet, and where they come from. */
export function Formula({ lines, source }: { lines: readonly ReactNode[]; source: string }) {
  return (
    <div className="space-y-1.5 px-3 py-2 text-[14px]">
      <ul className="space-y-0.5">
        {lines.map((line, i) => (
          <li key={i} className="font-mono text-[13px]">
            {line}
          </li>
        ))}
      </ul>
      <p className="text-[13px] text-graphite-soft">Source: {source}</p>
    </div>
  );
}

/** Where the formulas hold, as a short list. */
export function Validity({ items }: { items: readonly ReactNode[] }) {
  return (
    <ul className="list-disc space-y-0.5 py-2 pl-7 pr-3 text-[13px] text-graphite-soft">
      {items.map((item, i) => (
        <li key={i}>{item}</li>
      ))}
    </ul>
  );
}
