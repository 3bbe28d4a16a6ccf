// jstat ships no types and is CommonJS (default import only); this declares only the part Vialyard uses.
declare module 'jstat' {
  const jstat: {
    jStat: {
      normal: { inv(p: number, mean: number, sd: number): number; cdf(x: number, mean: number, sd: number): number };
    };
  };
  export default jstat;
}
