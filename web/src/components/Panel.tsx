import type { ReactNode } from "react";

/**
 * A panel of the sheet: a numbered title that says what it shows and in which unit and frame, a
 * hairline border, and optional tools on the right of the title row.
 */
export function Panel({
  id,
  index,
  title,
  subtitle,
  tools,
  children,
  className = "",
  bodyClassName = "",
  outOfDate,
}: {
  id: string;
  index?: string;
  title: string;
  subtitle?: ReactNode;
  tools?: ReactNode;
  children: ReactNode;
  className?: string;
  bodyClassName?: string;
  /**
   * When given, shown in place of the body: the panel's results were drawn from an input that is
   * no longer valid, so neither its numbers nor its verdicts may stay on screen.
   */
  outOfDate?: ReactNode;
}) {
  return (
    <section
      aria-labelledby={`${id}-title`}
      className={`flex min-w-0 flex-col rounded-sm border border-rule bg-panel ${className}`}
    >
      <header className="flex min-h-[2rem] items-center gap-2 border-b border-rule px-3 py-1">
        {index && <span className="num text-xs text-graphite-faint">{index}</span>}
        <h2 id={`${id}-title`} className="whitespace-nowrap text-[15px] font-semibold text-graphite">
          {title}
        </h2>
        {subtitle && <span className="min-w-0 truncate text-[13px] text-graphite-soft">{subtitle}</span>}
        {tools && <div className="ml-auto flex shrink-0 items-center gap-1.5">{tools}</div>}
      </header>
      {outOfDate ? (
        <div className="min-h-0 flex-1 px-3 py-2">{outOfDate}</div>
      ) : (
        <div className={`min-h-0 flex-1 ${bodyClassName}`}>{children}</div>
      )}
    </section>
  );
}
