import { NavLink, Outlet, useMatch } from "react-router-dom";
import { FooterCaution } from "../components/Caution";
import { LogoMark } from "../components/LogoMark";
import { UserMenu } from "../features/auth/components/UserMenu";
import { MailboxLink } from "../features/mailbox/components/MailboxPage";
import { ServerStatus } from "../features/system-status/components/ServerStatus";
import { useSession } from "../lib/session";

const navigation = [
  { to: "/", label: "Overview", end: true },
  { to: "/bench", label: "Bench", end: false },
  { to: "/calculators", label: "Calculators", end: false },
];

/** Header with the mark and navigation, the page, and a footer with the caution and server state. */
export function Layout() {
  // The bench is a working screen: full width and tighter margins so its panels fit 1280×800.
  const wide = useMatch("/bench") !== null;
  const signedIn = Boolean(useSession().data?.user);
  const links = signedIn
    ? [...navigation, { to: "/workspaces", label: "Workspaces", end: false }]
    : navigation;
  return (
    <div className="flex min-h-screen flex-col">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:bg-panel focus:p-2"
      >
        Skip to content
      </a>
      <header className="border-b border-rule bg-panel">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-8 gap-y-2 px-6 py-3">
          <NavLink
            to="/"
            className="flex items-center gap-2.5 text-graphite no-underline"
            aria-label="Sigmacube home"
          >
            <LogoMark size={30} />
            <span className="text-xl font-semibold tracking-tight">
              Sigma<span className="text-ink">cube</span>
            </span>
          </NavLink>
          <nav aria-label="Main" className="flex flex-wrap gap-1">
            {links.map((item) => (
              <NavLink
                key={item.to}
                to={item.to}
                end={item.end}
                className={({ isActive }) =>
                  `rounded px-3 py-1.5 text-[15px] ${isActive ? "bg-ink-wash text-ink font-semibold" : "text-graphite-soft hover:text-ink"}`
                }
              >
                {item.label}
              </NavLink>
            ))}
          </nav>
          <div className="ml-auto flex flex-wrap items-center gap-5">
            <MailboxLink />
            <UserMenu />
          </div>
        </div>
      </header>
      <main
        id="main"
        className={`mx-auto w-full flex-1 ${wide ? "max-w-[1600px] px-3 pb-2 pt-1.5" : "max-w-6xl px-6 py-8"}`}
      >
        <Outlet />
      </main>
      <footer className="border-t border-rule bg-panel">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center justify-between gap-x-8 gap-y-2 px-6 py-3 text-sm">
          <FooterCaution className="max-w-3xl" />
          <ServerStatus />
        </div>
      </footer>
    </div>
  );
}
