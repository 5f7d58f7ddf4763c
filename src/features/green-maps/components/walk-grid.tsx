// The grid of spots of a walked green (walk-green.tsx), as the golfer sees it, and each spot's place in words.
import clsx from "clsx";
import { SUSPECT_RESIDUAL_PCT } from "#shared/gradient-map";
import { slopeAndFallLine, type Gradient } from "#shared/phone-level";

export type Facing = "mark" | "north";
export type Grid = { nx: number; ny: number; spacingM: number; facing: Facing };
/** Spot k's place in words: rows from the near edge, spots from the left. */
export function spotWords(k: number, nx: number, facing: Facing = "mark"): string {
  const row = Math.floor(k / nx) + 1;
  const spot = (k % nx) + 1;
  return facing === "north" ? `row ${row} from the south, spot ${spot} from the west` : `row ${row}, spot ${spot} from the left`;
}

/** The spots as the golfer sees them from the near edge: the far row (toward the mark) on top. */
export function WalkGrid({
  grid,
  readings,
  current,
  residual,
  onRedo,
}: {
  grid: Grid;
  readings: (Gradient | null)[];
  current: number | null;
  residual: number[] | undefined;
  onRedo?: (k: number) => void;
}) {
  const rows = Array.from({ length: grid.ny }, (_, r) => grid.ny - 1 - r);
  return (
    <div className="overflow-x-auto">
      <table
        className="border-separate border-spacing-1 text-xs"
        aria-label={grid.facing === "north" ? "Walked spots, the north row first" : "Walked spots, the row toward the mark first"}
      >
        <tbody>
          {rows.map((j) => (
            <tr key={j}>
              {Array.from({ length: grid.nx }, (_, i) => {
                const k = j * grid.nx + i;
                const g = readings[k];
                const res = residual?.[k];
                const suspect = res !== undefined && res > SUSPECT_RESIDUAL_PCT;
                const label = g ? `${slopeAndFallLine(g).slopePct.toFixed(1)} %` : k === current ? "here" : "·";
                const cell = clsx(
                  "flex h-12 min-w-14 flex-col items-center justify-center rounded-lg border-2 px-1 tabular-nums",
                  k === current
                    ? "border-coral-500 bg-coral-50 font-semibold"
                    : g
                      ? "border-ink-900/20 bg-white"
                      : "border-dashed border-ink-900/20",
                  suspect && "border-bad-600 bg-bad-50 text-bad-800",
                );
                return (
                  <td key={i} className="p-0" data-testid={`spot-${k}`}>
                    {onRedo && g ? (
                      <button
                        type="button"
                        className={clsx(
                          cell,
                          "w-full focus-visible:outline-3 focus-visible:outline-offset-2 focus-visible:outline-coral-500",
                        )}
                        aria-label={`${spotWords(k, grid.nx, grid.facing)}: slope ${label}, misfit ${res?.toFixed(1) ?? "?"} %${suspect ? ", worth measuring again" : ""}. Measure it again.`}
                        onClick={() => onRedo(k)}
                      >
                        <span>{label}</span>
                        {res !== undefined ? <span className="text-[11px] text-ink-500">±{res.toFixed(1)}</span> : null}
                      </button>
                    ) : (
                      <div className={cell}>
                        <span aria-hidden="true">{label}</span>
                        <span className="sr-only">{`${spotWords(k, grid.nx, grid.facing)}: ${g ? label : k === current ? "measuring now" : "not yet"}`}</span>
                      </div>
                    )}
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
