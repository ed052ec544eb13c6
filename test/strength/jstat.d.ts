// Minimal typing for the parts of jstat (no bundled types) that the tests use.
declare module 'jstat' {
  type Continuous = { cdf(x: number, ...p: number[]): number; inv(p: number, ...q: number[]): number; mean(...p: number[]): number; variance(...p: number[]): number; pdf(x: number, ...p: number[]): number };
  const jStat: {
    studentt: { inv(p: number, dof: number): number; cdf(t: number, dof: number): number };
    normal: Continuous;
    lognormal: Continuous;
    uniform: Continuous;
    triangular: Continuous;
    spearmancoeff(a: number[], b: number[]): number;
  };
  export default jStat;
}
