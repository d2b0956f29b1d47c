// psychrolib ships no types; these are the calls the reference tests make (ASHRAE formulas, SI).
declare module 'psychrolib' {
  interface Psychrolib {
    readonly SI: unknown;
    SetUnitSystem(system: unknown): void;
    GetSatVapPres(temperatureC: number): number;
    GetHumRatioFromRelHum(
      temperatureC: number,
      relativeHumidity: number,
      pressurePa: number,
    ): number;
    GetHumRatioFromTDewPoint(dewPointC: number, pressurePa: number): number;
    GetMoistAirDensity(temperatureC: number, humidityRatio: number, pressurePa: number): number;
  }
  const psychrolib: Psychrolib;
  export default psychrolib;
}
