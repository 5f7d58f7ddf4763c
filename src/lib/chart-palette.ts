// One palette for every chart (recharts) and drawing of the make-rates, coach and training pages, built to be read
// outdoors on a phone: text is dark ink (never the series colour), and every series differs by a shape or a fill
// pattern as well as by colour, so nothing is told apart by colour alone. chart-palette.test.ts checks the contrast
// of every pair here against WCAG 2.1 (docs/sources.md, "Readable charts").

/** The surfaces charts are drawn on: the paper card (bg-sand-50) and plain white (print, dialogs). */
export const CHART_BACKGROUNDS = { paper: "#fcf9f3", white: "#ffffff" } as const;

/** Text in charts: legend labels, axis ticks and titles, direct labels. */
export const CHART_TEXT = { ink: "#131b2e", muted: "#37425e" } as const;

/** Grid lines: quiet on purpose (they are not information a reader must see). */
export const CHART_GRID = "#d9dfeb";

/** A symbol recharts can draw for a point and in the legend. */
export type ChartShape = "circle" | "square" | "triangle" | "diamond" | "cross" | "star" | "wye";

/** One series' look: its colour, the shape of its points and legend icon, a dash for its line, a fill pattern for its bars. */
export type SeriesLook = { colour: string; shape: ChartShape; dash?: string; pattern: PatternKind };

/** Bar fills besides colour: solid, or stripes, dots and checks drawn in white over the colour. */
export type PatternKind = "solid" | "diagonal" | "dots" | "horizontal" | "vertical" | "cross" | "reverse";

/**
 * Series in order: each differs from every other in colour, shape and (for bars) pattern. Every colour is a graphic
 * object that must stand out from the background by at least 3:1 (WCAG 2.1 SC 1.4.11).
 */
export const SERIES: readonly SeriesLook[] = [
  { colour: "#131b2e", shape: "circle", pattern: "solid" },
  { colour: "#c4462a", shape: "triangle", dash: "6 4", pattern: "diagonal" },
  { colour: "#2c7463", shape: "square", dash: "2 3", pattern: "dots" },
  { colour: "#a86a12", shape: "diamond", dash: "10 3 2 3", pattern: "horizontal" },
  { colour: "#1d4ed8", shape: "cross", dash: "1 3", pattern: "vertical" },
  { colour: "#7c3aed", shape: "star", dash: "8 3", pattern: "cross" },
  { colour: "#0e7490", shape: "wye", dash: "4 2", pattern: "reverse" },
];

/** The look of the i-th series (wrapping after the last; the shape then repeats with a new dash). */
export function seriesLook(i: number): SeriesLook {
  return SERIES[((i % SERIES.length) + SERIES.length) % SERIES.length]!;
}

/** Named roles of the make-rates charts. */
export const ROLE_COLOURS = {
  you: "#131b2e",
  /** The 95 % interval band, drawn as a translucent fill: its edge is the error bar, in `you`'s ink. */
  band: "#64708d",
  tour: "#c4462a",
  gain: "#2c7463",
  loss: "#b3282f",
} as const;

/** Every text colour with every background it is drawn on (what the contrast test checks). */
export const TEXT_PAIRS: readonly { text: string; background: string; what: string }[] = Object.values(CHART_TEXT).flatMap((text) =>
  Object.values(CHART_BACKGROUNDS).map((background) => ({ text, background, what: `chart text ${text} on ${background}` })),
);

/** Every graphic colour (lines, points, bars, legend swatches) with every background (the 3:1 check). */
export const GRAPHIC_PAIRS: readonly { colour: string; background: string }[] = [
  ...SERIES.map((s) => s.colour),
  ...Object.values(ROLE_COLOURS),
].flatMap((colour) => Object.values(CHART_BACKGROUNDS).map((background) => ({ colour, background })));

/** The id of a series' fill pattern (see ChartPatterns), for `fill="url(#…)"`. */
export function patternId(i: number): string {
  return `chart-pattern-${i % SERIES.length}`;
}
