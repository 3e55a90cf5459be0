/** Stands in for a page's controls when the member's role may not use them (the API would answer 403). */
export function SectionRefusal({
  headingId,
  title,
  reason,
}: {
  headingId: string;
  title: string;
  reason: string;
}) {
  return (
    <section aria-labelledby={headingId} className="space-y-3">
      <h2 id={headingId} className="text-lg font-semibold">
        {title}
      </h2>
      <p className="max-w-2xl rounded border border-rule bg-panel p-4 text-graphite">{reason}</p>
    </section>
  );
}
