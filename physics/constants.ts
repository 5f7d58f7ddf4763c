// Physical constants and equipment dimensions used by the putting model. SI units throughout.

/**
 * Standard gravity, m/s². Source: CGPM 1901 / ISO 80000-3 conventional value.
 * @example GRAVITY_MPS2 // 9.80665
 */
export const GRAVITY_MPS2 = 9.80665;

/**
 * One international foot in metres (exact by the 1959 international yard and pound agreement).
 * @example 10 * FOOT_M // 3.048
 */
export const FOOT_M = 0.3048;

/**
 * Ball diameter, m: the Rules of Golf minimum, 1.680 in = 42.67 mm (R&A/USGA Equipment Rules, former Appendix III).
 * @example BALL_DIAMETER_M / 2 // 0.021335
 */
export const BALL_DIAMETER_M = 0.04267;

/** Ball radius, m (half of {@link BALL_DIAMETER_M}). @example BALL_RADIUS_M // 0.021335 */
export const BALL_RADIUS_M = BALL_DIAMETER_M / 2;

/**
 * Ball mass, kg: the Rules of Golf maximum, 1.620 oz = 45.93 g (R&A/USGA Equipment Rules, former Appendix III).
 * @example BALL_MASS_KG // 0.04593
 */
export const BALL_MASS_KG = 0.04593;

/**
 * Hole diameter, m: 4¼ in = 4.25 × 0.0254 m = 107.95 mm exactly (Rules of Golf, Definitions, "Hole";
 * docs/sources.md). The one value of it: shared/units.ts re-exports this one.
 * @example HOLE_DIAMETER_M // 0.10795
 */
export const HOLE_DIAMETER_M = 4.25 * 0.0254;

/** Hole radius, m (half of {@link HOLE_DIAMETER_M}). @example HOLE_RADIUS_M // 0.053975 */
export const HOLE_RADIUS_M = HOLE_DIAMETER_M / 2;

/**
 * Speed of the ball leaving a Stimpmeter, m/s: 6.00 ft/s = 1.8288 m/s (USGA Stimpmeter Instruction Booklet,
 * widely quoted secondary value; a loss-free 20° ramp gives 1.885 m/s).
 * @example STIMP_EXIT_SPEED_MPS // 1.8288
 */
export const STIMP_EXIT_SPEED_MPS = 6 * FOOT_M;

/**
 * Moment-of-inertia ratio I/(mR²) of a uniform solid sphere, 2/5 (textbook rigid-body mechanics). A ball rolling
 * without slipping feels gravity along the slope reduced by 1/(1 + I/(mR²)) = 5/7.
 * @example 1 / (1 + SOLID_SPHERE_INERTIA_RATIO) // 0.7142857
 */
export const SOLID_SPHERE_INERTIA_RATIO = 2 / 5;

/**
 * A "good pace" roll-past distance, m: a missed putt should finish about 40–45 cm (17 in) past the hole
 * (common practice, no published source).
 * @example DEFAULT_ROLL_PAST_M // 0.45
 */
export const DEFAULT_ROLL_PAST_M = 0.45;
