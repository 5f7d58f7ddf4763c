import { useEffect, useRef, useState } from "react";
import { gradientFromUp, slopeAndFallLine, type Vec3 } from "../../../shared/phone-level";
import { TiltSensor } from "../../lib/tilt-sensor";

/** One TiltSensor for the component's life, stopped when it unmounts. */
export function useTiltSensor(): TiltSensor {
  const [sensor] = useState(() => new TiltSensor());
  useEffect(() => () => sensor.stop(), [sensor]);
  return sensor;
}

/** The slope under the phone right now, refreshed at most five times a second (for "now reading 2.1 %"). */
export function useLiveSlope(): [number | null, (up: Vec3 | null) => void] {
  const [slope, setSlope] = useState<number | null>(null);
  const last = useRef(0);
  const onSample = (up: Vec3 | null) => {
    const now = performance.now();
    if (now - last.current < 200 || !up) return;
    last.current = now;
    setSlope(slopeAndFallLine(gradientFromUp(up)).slopePct);
  };
  return [slope, onSample];
}
