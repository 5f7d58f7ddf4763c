import { NavLink } from "react-router";
import clsx from "clsx";
import { practiceNavItems } from "../nav";

/** Tabs across the practice log's pages: sessions, rounds on the course, greens, make rates, the practice plan. */
export function PracticeNav() {
  return (
    <nav aria-label="Practice log" className="-mt-2 mb-6 sm:-mt-4 print:hidden">
      <ul className="grid grid-cols-3 gap-1 rounded-xl bg-ink-900/5 p-1 sm:inline-grid sm:grid-cols-5">
        {practiceNavItems.map((item) => (
          <li key={item.to}>
            <NavLink
              to={item.to}
              end={item.end}
              className={({ isActive }) =>
                clsx(
                  "flex min-h-11 items-center justify-center rounded-lg px-2 text-sm font-medium whitespace-nowrap transition-colors sm:px-4",
                  isActive ? "bg-white text-ink-900 shadow-sm" : "text-ink-600 hover:text-ink-900",
                )
              }
            >
              {item.label}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
