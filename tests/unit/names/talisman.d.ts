// Types for the talisman modules the names tests use as reference implementations
// (talisman ships JavaScript only). Tests only: shared/ never imports talisman.
declare module 'talisman/metrics/damerau-levenshtein' {
  const damerauLevenshtein: (a: string, b: string) => number;
  export default damerauLevenshtein;
}
declare module 'talisman/metrics/jaro' {
  const jaro: (a: string, b: string) => number;
  export default jaro;
}
declare module 'talisman/metrics/jaro-winkler' {
  const jaroWinkler: (a: string, b: string) => number;
  export default jaroWinkler;
}
