import { useState } from "react";
import type { HeightMapSummary as Summary } from "#shared/schemas/height-map";
import { formatLength, formatShort, type UnitSystem } from "#shared/units";
import { Button } from "../../../components/ui";
import { useDeleteHeightMap } from "../api/delete-height-map";

function signedShort(m: number, units: UnitSystem): string {
  return `${m < -0.0005 ? "−" : ""}${formatShort(m, units)}`;
}

/** Size, spacing, height range and the steepest grade of the stored map, and (for the green's owner) a two-step delete. */
export function HeightMapSummary({
  greenId,
  summary,
  units,
  canEdit = true,
}: {
  greenId: string;
  summary: Summary;
  units: UnitSystem;
  canEdit?: boolean;
}) {
  const remove = useDeleteHeightMap(greenId);
  const [confirming, setConfirming] = useState(false);
  return (
    <section aria-label="The height map" className="flex flex-col gap-3">
      <h2 className="text-lg font-semibold tracking-tight">The height map</h2>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1.5 text-sm">
        <dt className="text-ink-600">Size</dt>
        <dd>
          {formatLength(summary.widthM, units)} east–west × {formatLength(summary.depthM, units)} north–south ({summary.nx} × {summary.ny}{" "}
          heights)
        </dd>
        <dt className="text-ink-600">Spacing</dt>
        <dd>
          {units === "metric" ? `${summary.spacingM} m` : `${formatShort(summary.spacingM, units)} (${summary.spacingM} m)`} between heights
        </dd>
        <dt className="text-ink-600">Heights</dt>
        <dd>
          {signedShort(summary.minHeightM, units)} to {signedShort(summary.maxHeightM, units)}:{" "}
          {formatShort(summary.maxHeightM - summary.minHeightM, units)} from the lowest ground to the highest
        </dd>
        <dt className="text-ink-600">Steepest</dt>
        <dd>{summary.maxSlopePct.toFixed(1)} % between neighbouring heights</dd>
        <dt className="text-ink-600">From</dt>
        <dd>
          {summary.source === "spots"
            ? `${summary.spotCount ?? "Some"} spot heights, filled in between`
            : summary.source === "walked"
              ? `Walked with a phone: ${summary.spotCount ?? "several"} spots, heights from their slopes`
              : "A grid of heights"}
        </dd>
      </dl>
      {!canEdit ? null : confirming ? (
        <div className="flex flex-wrap items-center gap-2" role="group" aria-label="Delete the height map?">
          <span className="text-sm font-medium">Delete this map? Reads on it go too.</span>
          <Button
            size="sm"
            variant="danger"
            loading={remove.isPending}
            onClick={() => remove.mutate(undefined, { onSettled: () => setConfirming(false) })}
          >
            Delete it
          </Button>
          <Button size="sm" variant="ghost" onClick={() => setConfirming(false)}>
            Keep it
          </Button>
        </div>
      ) : (
        <div>
          <Button size="sm" variant="secondary" onClick={() => setConfirming(true)}>
            Delete the height map
          </Button>
        </div>
      )}
    </section>
  );
}
