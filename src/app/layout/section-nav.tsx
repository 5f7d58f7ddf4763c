import { NavLink, useLocation } from "react-router";
import clsx from "clsx";
import { useMe } from "../../features/auth/api/get-me";
import { isNavItemActive, sectionFor, visibleNavItems } from "../nav";

/** Tabs across the pages of the area the page belongs to (reading putts, coaching), under the top bar. */
export function SectionNav() {
  const { pathname } = useLocation();
  const me = useMe();
  const role = me.data?.user.role ?? null;
  const section = sectionFor(pathname, role);
  if (!section) return null;
  const items = visibleNavItems(section.items, { role, devMail: false });
  // The most specific tab wins (/ladders/mine is "My ladders", not "Ladders").
  const active = items.filter((i) => isNavItemActive(pathname, i)).sort((a, b) => b.to.length - a.to.length)[0];
  return (
    <nav aria-label={section.label} className="-mt-2 mb-6 overflow-x-auto sm:-mt-4 print:hidden">
      <ul className="inline-flex gap-1 rounded-xl bg-ink-900/5 p-1">
        {items.map((item) => (
          <li key={item.to}>
            <NavLink
              to={item.to}
              aria-current={item === active ? "page" : undefined}
              className={clsx(
                "flex min-h-11 items-center justify-center rounded-lg px-3 text-sm font-medium whitespace-nowrap transition-colors sm:px-4",
                item === active ? "bg-white text-ink-900 shadow-sm" : "text-ink-600 hover:text-ink-900",
              )}
            >
              {item.label}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
