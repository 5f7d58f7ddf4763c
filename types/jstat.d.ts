// jstat ships no declarations; this is the part the statistics tests use as a cross-check.
declare module "jstat" {
  interface JStatInstance {
    twoSidedDifferenceOfProportions(p1: number, n1: number, p2: number, n2: number): number;
  }
  interface JStat {
    (): JStatInstance;
    normal: { inv(p: number, mean: number, sd: number): number; cdf(x: number, mean: number, sd: number): number };
    ztest(z: number, sides: 1 | 2): number;
  }
  const jStat: JStat;
  export default jStat;
}
