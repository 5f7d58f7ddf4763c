import { useEffect, useId, useRef, useState } from "react";
import { Link, useLocation } from "react-router";
import clsx from "clsx";
import { LogoMark } from "../../components/ui";
import { paths } from "../../config/paths";
import { useMe } from "../../features/auth/api/get-me";
import { AccountIndicator } from "../../features/auth/components/account-indicator";
import { useDevMailAvailable } from "../../features/dev-mail/api/get-dev-mail";
import { isNavItemActive, navItems, visibleNavItems } from "../nav";

function useVisibleNav() {
  const me = useMe();
  const devMail = useDevMailAvailable();
  return visibleNavItems(navItems, { role: me.data?.user.role ?? null, devMail });
}

const desktopLink = ({ isActive }: { isActive: boolean }) =>
  clsx(
    "flex min-h-11 items-center rounded-lg px-3 text-sm font-medium transition-colors",
    isActive
      ? "bg-sand-50/10 text-sand-50 shadow-[inset_0_-2px_0_var(--color-coral-400)]"
      : "text-sand-200 hover:bg-sand-50/5 hover:text-sand-50",
  );

const mobileLink = ({ isActive }: { isActive: boolean }) =>
  clsx(
    "flex min-h-12 items-center rounded-xl px-4 text-base font-medium",
    isActive ? "bg-sand-50/10 text-sand-50 shadow-[inset_3px_0_0_var(--color-coral-400)]" : "text-sand-200 hover:bg-sand-50/5",
  );

export function TopBar() {
  const items = useVisibleNav();
  const menuId = useId();
  const buttonRef = useRef<HTMLButtonElement>(null);
  const { pathname } = useLocation();
  // The menu remembers the page it was opened on, so moving to another page closes it.
  const [openOn, setOpenOn] = useState<string | null>(null);
  const open = openOn === pathname;
  const setOpen = (next: boolean) => setOpenOn(next ? pathname : null);

  useEffect(() => {
    if (!open) return;
    const onKey = (event: KeyboardEvent) => {
      if (event.key === "Escape") {
        setOpenOn(null);
        buttonRef.current?.focus();
      }
    };
    document.addEventListener("keydown", onKey);
    return () => document.removeEventListener("keydown", onKey);
  }, [open]);

  return (
    <header className="sticky top-0 z-40 bg-ink-900 text-sand-50 shadow-[0_1px_0_rgb(0_0_0/0.2)] print:hidden">
      <div className="mx-auto flex h-16 max-w-6xl items-center gap-4 px-4 sm:px-6">
        <Link to={paths.home.href()} className="flex min-h-11 items-center gap-2.5 rounded-lg pr-2 text-xl font-semibold tracking-tight">
          <LogoMark />
          Borrowline
        </Link>

        <nav aria-label="Main" className="ml-4 hidden lg:block">
          <ul className="flex items-center gap-1">
            {items.map((item) => (
              <li key={item.to}>
                <Link
                  to={item.to}
                  aria-current={isNavItemActive(pathname, item) ? "page" : undefined}
                  className={desktopLink({ isActive: isNavItemActive(pathname, item) })}
                >
                  {item.label}
                </Link>
              </li>
            ))}
          </ul>
        </nav>

        <div className="ml-auto hidden lg:block">
          <AccountIndicator />
        </div>

        <button
          ref={buttonRef}
          type="button"
          className="ml-auto flex min-h-11 items-center gap-2 rounded-lg border border-sand-50/20 px-3 text-sm font-medium hover:bg-sand-50/10 lg:hidden"
          aria-expanded={open}
          aria-controls={menuId}
          onClick={() => setOpen(!open)}
        >
          <svg aria-hidden="true" viewBox="0 0 20 20" className="size-5 fill-current">
            {open ? (
              <path d="M5.3 5.3a1 1 0 0 1 1.4 0L10 8.6l3.3-3.3a1 1 0 1 1 1.4 1.4L11.4 10l3.3 3.3a1 1 0 0 1-1.4 1.4L10 11.4l-3.3 3.3a1 1 0 0 1-1.4-1.4L8.6 10 5.3 6.7a1 1 0 0 1 0-1.4Z" />
            ) : (
              <path d="M3 5.5A1 1 0 0 1 4 4.5h12a1 1 0 1 1 0 2H4a1 1 0 0 1-1-1Zm0 4.5a1 1 0 0 1 1-1h12a1 1 0 1 1 0 2H4a1 1 0 0 1-1-1Zm1 3.5a1 1 0 1 0 0 2h12a1 1 0 1 0 0-2H4Z" />
            )}
          </svg>
          Menu
        </button>
      </div>

      <div id={menuId} hidden={!open} className="border-t border-sand-50/10 lg:hidden">
        <nav aria-label="Main" className="mx-auto max-w-6xl px-4 pt-3 pb-2 sm:px-6">
          <ul className="flex flex-col gap-1">
            {items.map((item) => (
              <li key={item.to}>
                <Link
                  to={item.to}
                  aria-current={isNavItemActive(pathname, item) ? "page" : undefined}
                  className={mobileLink({ isActive: isNavItemActive(pathname, item) })}
                  onClick={() => setOpen(false)}
                >
                  {item.label}
                </Link>
              </li>
            ))}
          </ul>
        </nav>
        <div className="mx-auto max-w-6xl border-t border-sand-50/10 px-4 pt-4 pb-5 sm:px-6">
          <AccountIndicator layout="menu" onNavigate={() => setOpen(false)} />
        </div>
      </div>
    </header>
  );
}
