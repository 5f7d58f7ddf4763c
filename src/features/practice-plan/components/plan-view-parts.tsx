// What the practice plan view's sections share (plan-view.tsx, weekly-check.tsx): a heading at the level of the page
// it sits on (the player's page, under its h1, or the coach's player page, under its h2), and the table cells' classes.
import type { ReactNode } from "react";

export type Mode = "player" | "coach";
export type Level = 2 | 3 | 4 | 5;

/** A heading at the level the page needs: under the player's h1, or under the coach page's h2. */
export function H({ level, id, className, children }: { level: Level; id?: string; className?: string; children: ReactNode }) {
  const Tag = `h${level}` as const;
  return (
    <Tag id={id} className={className ?? "text-lg font-semibold tracking-tight"}>
      {children}
    </Tag>
  );
}

export const th = "px-3 py-2 text-left font-semibold whitespace-nowrap";
export const td = "px-3 py-2 align-top whitespace-nowrap";
