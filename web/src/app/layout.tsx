import { useState, type KeyboardEvent, type MouseEvent } from "react";
import { NavLink, Outlet, useMatch } from "react-router-dom";
import { FooterCaution } from "../components/Caution";
import { LogoMark } from "../components/LogoMark";
import { UserMenu } from "../features/auth/components/UserMenu";
import { MailboxLink } from "../features/mailbox/components/MailboxPage";
import { ServerStatus } from "../features/system-status/components/ServerStatus";
import { useSession } from "../lib/session";
import { usePageTitle } from "./use-page-title";

const navigation = [
  { to: "/", label: "Overview", end: true },
  { to: "/bench", label: "Bench", end: false },
  { to: "/calculators", label: "Calculators", end: false },
];

/**
 * Header with the mark and navigation, the page, and a footer with the caution and server state.
 * Below the `md` width the navigation and the account links fold behind a Menu button, so a
 * phone's header stays one row and Sign out is one tap away rather than off-screen.
 */
export function Layout() {
  const [menuOpen, setMenuOpen] = useState(false);
  usePageTitle();
  // Following a link or pressing a button in the folded menu closes it; Escape closes it too.
  const closeOnChoice = (event: MouseEvent) => {
    if ((event.target as HTMLElement).closest("a, button")) setMenuOpen(false);
  };
  const closeOnEscape = (event: KeyboardEvent) => {
    if (event.key !== "Escape" || !menuOpen) return;
    setMenuOpen(false);
    document.getElementById("site-menu-button")?.focus();
  };
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
        <div
          className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-8 gap-y-2 px-4 py-3 sm:px-6"
          onKeyDown={closeOnEscape}
        >
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
          <button
            id="site-menu-button"
            type="button"
            className="ml-auto rounded border border-rule-strong px-3 py-1.5 text-[15px] font-semibold text-graphite hover:text-ink md:hidden"
            aria-expanded={menuOpen}
            aria-controls="site-menu"
            onClick={() => setMenuOpen((open) => !open)}
          >
            <span aria-hidden="true">{menuOpen ? "✕ " : "☰ "}</span>
            Menu
          </button>
          {/* Clicks here only close the folded menu after a choice; the links and buttons inside take the keyboard. */}
          <div
            id="site-menu"
            onClick={closeOnChoice}
            className={`${menuOpen ? "flex" : "hidden"} w-full flex-col gap-3 border-t border-rule pt-3 md:flex md:w-auto md:flex-1 md:flex-row md:items-center md:gap-8 md:border-0 md:pt-0`}
          >
            <nav aria-label="Main" className="flex flex-col gap-1 md:flex-row">
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
            <div className="flex flex-wrap items-center gap-x-5 gap-y-2 px-3 md:ml-auto md:px-0">
              <MailboxLink />
              <UserMenu />
            </div>
          </div>
        </div>
      </header>
      <main
        id="main"
        className={`mx-auto w-full flex-1 ${wide ? "max-w-[1600px] px-3 pb-2 pt-1.5" : "max-w-6xl px-4 py-6 sm:px-6 sm:py-8"}`}
      >
        <Outlet />
      </main>
      <footer className="border-t border-rule bg-panel">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center justify-between gap-x-8 gap-y-2 px-4 py-3 text-sm sm:px-6">
          <FooterCaution className="max-w-3xl" />
          <ServerStatus />
        </div>
      </footer>
    </div>
  );
}
