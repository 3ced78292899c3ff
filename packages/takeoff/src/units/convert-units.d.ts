// convert-units 2.3.4 ships no types; only the chain the tests use is declared here.
// It is a dev dependency used as an independent reference in unit tests, never at run time.
declare module 'convert-units' {
  interface Converter {
    from(unit: string): { to(unit: string): number };
  }
  function convert(value: number): Converter;
  export default convert;
}
