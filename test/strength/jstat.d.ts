// Minimal typing for the parts of jstat (no bundled types) that the strength tests use.
declare module 'jstat' {
  const jStat: {
    studentt: { inv(p: number, dof: number): number; cdf(t: number, dof: number): number };
  };
  export default jStat;
}
