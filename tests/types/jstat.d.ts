// jStat ships no types; the tests use only its chi-square quantile, as an oracle.
declare module "jstat" {
  const jStat: { chisquare: { inv(p: number, dof: number): number } };
  export default jStat;
}
