/**
 * Minimal typing of the npm `psychrolib` package (ASHRAE psychrometrics, Hyland–Wexler), which ships
 * none. Only the tests import it, as an outside reference; the SI unit system must be selected with
 * SetUnitSystem(SI) before any call (module-global state). SI units: °C, Pa, RH as a fraction 0..1.
 */
declare module 'psychrolib' {
  interface PsychroLib {
    readonly SI: number;
    readonly IP: number;
    SetUnitSystem(unitSystem: number): void;
    GetUnitSystem(): number;
    GetSatVapPres(dryBulb: number): number;
    GetTDewPointFromRelHum(dryBulb: number, relativeHumidity: number): number;
    GetTDewPointFromVapPres(dryBulb: number, vapourPressure: number): number;
    GetVapPresFromRelHum(dryBulb: number, relativeHumidity: number): number;
    GetRelHumFromVapPres(dryBulb: number, vapourPressure: number): number;
    GetRelHumFromTDewPoint(dryBulb: number, dewPoint: number): number;
    GetVapPresFromTDewPoint(dewPoint: number): number;
  }
  const psychrolib: PsychroLib;
  export default psychrolib;
}
