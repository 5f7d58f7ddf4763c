// The key to our slope cue: height shading (lighter is higher) and contour lines a stated step apart.
import type { ReactNode } from "react";
import { METRES_PER_INCH, type UnitSystem } from "../../../shared/units";
import { fallLineWords } from "./words";

function stepWords(m: number, units: UnitSystem): string {
  if (units === "imperial") {
    const inches = m / METRES_PER_INCH;
    return `${Number(inches.toFixed(2))} in`;
  }
  const cm = m * 100;
  return `${Number(cm.toFixed(1))} cm`;
}

function dropWords(slopePct: number, units: UnitSystem): string {
  if (units === "imperial") return `${Number(((slopePct / 100) * 12).toFixed(2))} in of drop per foot`;
  return `${Number(slopePct.toFixed(2))} cm of drop per metre`;
}

export type SlopeLegendProps = {
  slopePct: number;
  fallLineDeg: number;
  contourIntervalM: number | null;
  units: UnitSystem;
  exaggeration?: number;
  /** Read training "by eye": the slope and fall line are not named (the key to the shading still is). */
  slopeHidden?: boolean;
  /** False when the flat diagram stands in for the 3D view: it has no shading or contour lines to explain. */
  shaded?: boolean;
  children?: ReactNode;
};

export function SlopeLegend({
  slopePct,
  fallLineDeg,
  contourIntervalM,
  units,
  exaggeration = 1,
  shaded = true,
  slopeHidden = false,
  children,
}: SlopeLegendProps) {
  return (
    <div className="flex flex-col gap-2 text-sm text-ink-700">
      {slopeHidden ? (
        <p className="font-semibold text-ink-900">Which way and how much the green falls is yours to read from the picture.</p>
      ) : (
        <p>
          <span className="font-semibold text-ink-900">The green {fallLineWords(fallLineDeg)}</span>
          {slopePct > 0 ? `: ${Number(slopePct.toFixed(2))} % slope, ${dropWords(slopePct, units)}.` : ": it is flat."}
        </p>
      )}
      {shaded && slopePct > 0 ? (
        <div className="flex items-center gap-2" aria-hidden="true">
          <span className="text-xs font-medium">higher</span>
          <span className="h-3 flex-1 rounded-full bg-linear-to-r from-[#b4dd8e] to-[#2b6638] ring-1 ring-ink-900/10" />
          <span className="text-xs font-medium">lower</span>
        </div>
      ) : null}
      {shaded ? (
        <p className="text-ink-500">
          Lighter ground is higher.{" "}
          {contourIntervalM
            ? `Thin lines join ground of equal height, one every ${stepWords(contourIntervalM, units)} of height; the green falls across them.`
            : null}
          {exaggeration > 1 ? ` The tilt is drawn ${exaggeration}× steeper than it is, so you can see it.` : null}
        </p>
      ) : null}
      {children}
    </div>
  );
}
