// The key to the map and the 3D view, in plain words.
import type { UnitSystem } from "#shared/units";
import { SLOPE_BANDS } from "../utils/slope-ticks";

export function stepWords(m: number, units: UnitSystem): string {
  if (units === "imperial") return `${Number((m / 0.0254).toFixed(2))} in`;
  return `${Number((m * 100).toFixed(1))} cm`;
}

export function MapLegend({
  contourIntervalM,
  units,
  ticks = true,
}: {
  contourIntervalM: number | null;
  units: UnitSystem;
  /** Whether the key to the map's slope ticks is shown (the 3D view has none). */
  ticks?: boolean;
}) {
  return (
    <div className="flex flex-col gap-2 text-sm text-ink-700">
      <div className="flex items-center gap-2" aria-hidden="true">
        <span className="text-xs font-medium">higher</span>
        <span className="h-3 flex-1 rounded-full bg-linear-to-r from-[#b4dd8e] to-[#2b6638] ring-1 ring-ink-900/10" />
        <span className="text-xs font-medium">lower</span>
      </div>
      <p>
        Lighter ground is higher, darker ground lower.{" "}
        {contourIntervalM
          ? `Thin lines join ground of equal height, one every ${stepWords(contourIntervalM, units)} of height: where they crowd, the green is steeper.`
          : null}
      </p>
      {ticks ? (
        <div className="flex flex-col gap-1.5">
          <p>
            Each short tick lies along the fall line, its bead at the low end; its colour says how steep the ground is there (all ticks are
            the same length):
          </p>
          <ul className="flex flex-wrap gap-x-4 gap-y-1" aria-label="Slope colours">
            {SLOPE_BANDS.map((b) => (
              <li key={b.label} className="flex items-center gap-1.5">
                <svg width="30" height="12" aria-hidden="true">
                  <line x1="3" y1="6" x2="23" y2="6" stroke="#0b1120" strokeOpacity="0.55" strokeWidth="5" strokeLinecap="round" />
                  <line x1="3" y1="6" x2="23" y2="6" stroke={b.colour} strokeWidth="2.5" strokeLinecap="round" />
                  <circle cx="23" cy="6" r="3.4" fill={b.colour} stroke="#0b1120" strokeWidth="1.2" />
                </svg>
                {b.label}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </div>
  );
}
