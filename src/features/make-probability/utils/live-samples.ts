// Apart from live-odds.ts so the panel can name the number without loading the physics engine with the page.
/** Few enough for ~10 ms a run, enough for a make probability within about ±1 % (one standard error). */
export const LIVE_SAMPLES = 2000;
