// Plain words for what the scene shows: written once in shared/format.ts (issue 16), named here for the 3D code.
export { aimWords, fallLineWords, holeWidthsWords } from "../../../shared/format";
