import type { BadRows } from "../../../../../core";

/** The rows left out, by line number: the first few with their reason, then how many more. */
export function BadRowsNote({ badRows }: { badRows: BadRows }) {
  if (badRows.count === 0) return <p className="text-sm text-graphite-soft">Every row was read.</p>;
  const rest = badRows.count - badRows.first.length;
  return (
    <div className="text-sm" data-testid="bad-rows">
      <p>
        <span className="num">{badRows.count.toLocaleString("en-US")}</span> row
        {badRows.count === 1 ? "" : "s"} left out:
      </p>
      <ul className="ml-4 list-disc">
        {badRows.first.map((r) => (
          <li key={r.line}>
            line <span className="num">{r.line.toLocaleString("en-US")}</span>: {r.reason}
          </li>
        ))}
      </ul>
      {rest > 0 && (
        <p className="text-graphite-soft">
          and <span className="num">{rest.toLocaleString("en-US")}</span> more.
        </p>
      )}
    </div>
  );
}
