// Pure statistics of the practice log: intervals, bands, the tour baseline, strokes gained, period tests.
export * from "./bands";
export * from "./baseline";
export * from "./strokes-gained";
export * from "./two-proportion";
export * from "./wilson";
