export const BREAK_TYPES = ["uphill", "downhill", "left-to-right", "right-to-left", "straight"] as const;
export type BreakType = (typeof BREAK_TYPES)[number];
export const MISS_SIDES = ["left", "right"] as const;
export type MissSide = (typeof MISS_SIDES)[number];
