// The phone's gravity reading for "measure on the green" and "map this green": permission where the browser asks
// for one (iOS: DeviceMotionEvent.requestPermission, from the tap itself), DeviceMotionEvent's
// accelerationIncludingGravity first and DeviceOrientationEvent's beta/gamma where motion gives nothing, and
// "held still for two seconds" readings (shared/phone-level.ts does the maths).
import {
  STILL_RULES,
  headingFromOrientation,
  meanHeadingDeg,
  stillReading,
  upFromMotion,
  upFromOrientation,
  type OrientationSample,
  type StillReading,
  type Vec3,
} from "../../shared/phone-level";

/** Why there is no reading: no sensor API, not https, permission refused, nothing arrives, or the phone never settles. */
export type TiltProblem = "unsupported" | "insecure" | "denied" | "no-readings" | "kept-moving";

/** No sample at all within this long after starting: the device has no sensor (a desk computer). */
const NO_READINGS_MS = 2500;
/** Not still within this long: the phone is being held or the ground is moving it. */
const KEPT_MOVING_MS = 30_000;
/** A turned or moved phone: an angle from the last reading's up above this counts as handled (or a shaken sample). */
const MOVED_DEG = 1.5;

/** A still reading with the compass heading of the phone's top edge over the same window (null: no compass). */
export type HeadedReading = StillReading & { headingDeg: number | null };

/** Why "top edge toward north" cannot be offered on this browser, or null where it can be tried. */
export function compassUnavailableReason(): string | null {
  if (typeof window === "undefined" || !("DeviceOrientationEvent" in window)) return "This browser gives no compass heading.";
  const proto = (window as unknown as { DeviceOrientationEvent: { prototype: object } }).DeviceOrientationEvent.prototype;
  if ("ondeviceorientationabsolute" in window || "webkitCompassHeading" in proto) return null;
  return "This browser gives the phone's tilt but not a compass heading.";
}

export const NO_HEADING_WORDS =
  "No compass heading came from this phone. Start over and lay the phone toward a fixed mark instead (or calibrate the compass in the phone's settings).";

type PermissionApi = { requestPermission?: () => Promise<"granted" | "denied" | "default"> };

export const TILT_PROBLEM_WORDS: Record<TiltProblem, string> = {
  unsupported: "This browser gives no tilt readings. Type the slope and pick the fall line instead.",
  insecure: "The phone's tilt sensor works only on a secure (https) address.",
  denied:
    "The browser was not allowed to read the phone's motion. Allow motion and orientation for this site in its settings, then try again.",
  "no-readings":
    "No tilt readings came from this device: a desk computer has no sensor. Measure with a phone on the green, or type the slope and pick the fall line.",
  "kept-moving": "The phone never lay still for two seconds. Lay it flat on the green and take your hand away.",
};

/**
 * Listens to the device's gravity. `start()` must be called from a tap or key press (iOS asks for permission then).
 * `waitForStill` resolves with the first two-second window that is still, or a problem.
 */
export class TiltSensor {
  private samples: { t: number; up: Vec3 }[] = [];
  private lastMotionT = Number.NEGATIVE_INFINITY;
  private listeners = new Set<() => void>();
  private disturbed = false;
  private moveFrom: Vec3 | null = null;
  private started = false;
  private headings: { t: number; h: number }[] = [];
  /** The latest compass heading of the top edge (degrees clockwise from north), or null. */
  latestHeading: number | null = null;
  /** Samples seen since start (any source), and the latest up vector. */
  count = 0;
  latest: Vec3 | null = null;

  private readonly onMotion = (e: DeviceMotionEvent) => {
    const t = performance.now() / 1000;
    const up = upFromMotion(e.accelerationIncludingGravity);
    if (e.accelerationIncludingGravity?.x == null) return;
    this.lastMotionT = t;
    this.push(t, up);
  };

  private readonly onHeading = (e: DeviceOrientationEvent) => {
    const h = headingFromOrientation(e as DeviceOrientationEvent & OrientationSample);
    if (h === null) return;
    const t = performance.now() / 1000;
    this.latestHeading = h;
    this.headings.push({ t, h });
    while (this.headings.length > 0 && t - this.headings[0]!.t > STILL_RULES.windowS + 0.5) this.headings.shift();
  };

  private readonly onOrientation = (e: DeviceOrientationEvent) => {
    this.onHeading(e);
    const t = performance.now() / 1000;
    if (t - this.lastMotionT < 1 || e.beta == null || e.gamma == null) return;
    this.push(t, upFromOrientation(e.beta, e.gamma));
  };

  private push(t: number, up: Vec3 | null) {
    this.count++;
    if (!up) {
      // A shaken phone or one on its edge: not a reading, but it has been moved.
      this.disturbed = true;
      this.samples = [];
    } else {
      if (this.moveFrom && angleDeg(this.moveFrom, up) > MOVED_DEG) this.disturbed = true;
      this.latest = up;
      this.samples.push({ t, up });
      while (this.samples.length > 0 && t - this.samples[0]!.t > STILL_RULES.windowS + 0.5) this.samples.shift();
    }
    for (const l of this.listeners) l();
  }

  /** Asks for permission where needed and starts listening; null when running, else why not. */
  async start(): Promise<TiltProblem | null> {
    if (this.started) return null;
    if (typeof window === "undefined" || (!("DeviceMotionEvent" in window) && !("DeviceOrientationEvent" in window))) return "unsupported";
    if (!window.isSecureContext) return "insecure";
    const motion = (window as unknown as { DeviceMotionEvent?: PermissionApi }).DeviceMotionEvent;
    const orientation = (window as unknown as { DeviceOrientationEvent?: PermissionApi }).DeviceOrientationEvent;
    try {
      if (typeof motion?.requestPermission === "function") {
        if ((await motion.requestPermission()) !== "granted") return "denied";
      }
      if (typeof orientation?.requestPermission === "function") {
        await orientation.requestPermission().catch(() => "denied");
      }
    } catch {
      return "denied";
    }
    window.addEventListener("devicemotion", this.onMotion);
    window.addEventListener("deviceorientation", this.onOrientation);
    window.addEventListener("deviceorientationabsolute", this.onHeading);
    this.started = true;
    return null;
  }

  /** The golfer says the phone has been turned or moved (a flat spot may not show it): the next still window counts. */
  markMoved() {
    this.disturbed = true;
    this.samples = [];
  }

  /** The mean compass heading over the last `spanS` seconds (the still reading's window), or null. */
  private headingOver(spanS: number): number | null {
    const now = performance.now() / 1000;
    // No slack before the window: a heading from before the phone was laid down must not count.
    return meanHeadingDeg(this.headings.filter((x) => now - x.t <= spanS).map((x) => x.h));
  }

  stop() {
    window.removeEventListener("devicemotion", this.onMotion);
    window.removeEventListener("deviceorientation", this.onOrientation);
    window.removeEventListener("deviceorientationabsolute", this.onHeading);
    this.started = false;
    this.listeners.clear();
  }

  /**
   * The next still two-second reading. With `afterMove`, the phone must first be moved (picked up, turned) away from
   * that reading, so the reading before a half turn or before walking on is not taken twice. `onSample` sees every
   * sample (to show the live spread); `signal` cancels.
   */
  waitForStill(
    opts: { afterMove?: Vec3; signal?: AbortSignal; onSample?: (latest: Vec3 | null) => void } = {},
  ): Promise<HeadedReading | TiltProblem | "cancelled"> {
    this.samples = [];
    this.disturbed = !opts.afterMove;
    this.moveFrom = opts.afterMove ?? null;
    const startCount = this.count;
    return new Promise((resolve) => {
      const done = (r: HeadedReading | TiltProblem | "cancelled") => {
        this.listeners.delete(check);
        window.clearTimeout(noReadings);
        window.clearTimeout(keptMoving);
        opts.signal?.removeEventListener("abort", abort);
        resolve(r);
      };
      const check = () => {
        opts.onSample?.(this.latest);
        if (!this.disturbed) {
          this.samples = [];
          return;
        }
        const r = stillReading(this.samples);
        if (r) done({ ...r, headingDeg: this.headingOver(r.spanS) });
      };
      const abort = () => done("cancelled");
      const noReadings = window.setTimeout(() => {
        if (this.count === startCount) done("no-readings");
      }, NO_READINGS_MS);
      const keptMoving = window.setTimeout(() => done("kept-moving"), KEPT_MOVING_MS);
      opts.signal?.addEventListener("abort", abort);
      this.listeners.add(check);
    });
  }
}

function angleDeg(a: Vec3, b: Vec3): number {
  const dot = Math.min(1, Math.max(-1, a[0] * b[0] + a[1] * b[1] + a[2] * b[2]));
  return (Math.acos(dot) * 180) / Math.PI;
}

export function isTiltProblem(r: unknown): r is TiltProblem {
  return typeof r === "string" && r in TILT_PROBLEM_WORDS;
}
