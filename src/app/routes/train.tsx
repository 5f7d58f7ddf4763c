import { TrainPage } from "../../features/training/components/train-page";

// The 3D green and the history chart inside are loaded lazily, so three.js and recharts stay out of this chunk.
export function TrainRoute() {
  return <TrainPage />;
}

export { TrainRoute as Component };
