// The key to the map and the 3D view, in plain words.
import type { UnitSystem } from "../../../../shared/units";

export function stepWords(m: number, units: UnitSystem): string {
  if (units === "imperial") return `${Number((m / 0.0254).toFixed(2))} in`;
  return `${Number((m * 100).toFixed(1))} cm`;
}

export function MapLegend({
  contourIntervalM,
  units,
  arrows = true,
}: {
  contourIntervalM: number | null;
  units: UnitSystem;
  arrows?: boolean;
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
        {arrows ? " Arrows point downhill; longer arrows mark steeper ground." : null}
      </p>
    </div>
  );
}
