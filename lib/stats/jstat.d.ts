// jstat ships no types; only the parts Tearline uses are declared here.
declare module "jstat" {
  interface JStatDistribution {
    cdf(x: number, ...params: number[]): number;
    inv(p: number, ...params: number[]): number;
    pdf(x: number, ...params: number[]): number;
  }
  interface JStatStatic {
    normal: JStatDistribution;
    chisquare: JStatDistribution;
    lowRegGamma(a: number, x: number): number;
    ibeta(x: number, a: number, b: number): number;
  }
  const jStat: JStatStatic;
  export default jStat;
}
