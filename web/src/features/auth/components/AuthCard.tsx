import type { ReactNode } from "react";

/** The narrow sheet that holds the sign-in, sign-up and password forms. */
export function AuthCard({
  title,
  intro,
  children,
}: {
  title: string;
  intro?: ReactNode;
  children: ReactNode;
}) {
  return (
    <section className="mx-auto max-w-md rounded border border-rule bg-panel p-8">
      <h1 className="text-2xl font-semibold tracking-tight">{title}</h1>
      {intro && <p className="mt-2 text-graphite-soft">{intro}</p>}
      <div className="mt-6">{children}</div>
    </section>
  );
}
