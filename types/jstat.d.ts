// Minimal typings for the parts of jstat that Mooring uses (jstat ships no types).
declare module 'jstat' {
  interface Continuous1 {
    cdf(x: number, a: number): number;
    inv(p: number, a: number): number;
  }
  interface Continuous2 {
    cdf(x: number, a: number, b: number): number;
    inv(p: number, a: number, b: number): number;
  }
  interface JStatStatic {
    normal: Continuous2;
    studentt: Continuous1;
    centralF: Continuous2;
    chisquare: Continuous1;
    /** Regularized incomplete beta I_x(a, b). */
    ibeta(x: number, a: number, b: number): number;
    jStat?: JStatStatic;
  }
  const jStat: JStatStatic;
  export default jStat;
}
