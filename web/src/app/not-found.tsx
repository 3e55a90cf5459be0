import { Link, useLocation } from "react-router-dom";

/** Any path the app does not know. */
export function NotFoundPage() {
  const location = useLocation();
  return (
    <section className="mx-auto max-w-xl py-16 text-center">
      <p className="num text-5xl text-graphite-faint">404</p>
      <h1 className="mt-4 text-2xl font-semibold">No page at this address</h1>
      <p className="mt-2 text-graphite-soft">
        Nothing lives at{" "}
        <code className="num rounded bg-paper-deep px-1.5 py-0.5 text-sm">{location.pathname}</code>. Check
        the link you followed, or start again from the overview.
      </p>
      <Link
        to="/"
        className="mt-6 inline-block rounded bg-ink px-4 py-2 font-semibold text-panel hover:bg-ink-hover"
      >
        Go to the overview
      </Link>
    </section>
  );
}
