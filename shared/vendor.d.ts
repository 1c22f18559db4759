// jstat ships no type declarations; we use only the normal quantile.
declare module 'jstat' {
  export const jStat: { normal: { inv(p: number, mean: number, sd: number): number } };
}
