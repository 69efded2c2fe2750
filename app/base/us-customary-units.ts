/**
 * US customary units as multiples of the SI units Lamina stores, each computed here from the exact
 * definitions rather than typed as a rounded factor (reference notes §11; NIST Special Publication
 * 811 (2008), Appendix B, lists the same factors, and tests/base checks them against its digits).
 * A value of 1 in a US unit is `US_UNITS.<unit>` in the SI unit named beside it.
 */

// Exact definitions (reference notes §11): the international inch, foot and avoirdupois pound of
// 1959, the International Table British thermal unit, the hour, and the size of a Fahrenheit degree.
const INCH = 0.0254; // m
const FOOT = 0.3048; // m
const POUND = 0.45359237; // kg
const BTU = 1055.05585262; // J
const HOUR = 3600; // s
const FAHRENHEIT_DEGREE = 5 / 9; // K, a temperature difference of 1 °F

// Exact definitions not in the reference notes (from memory): the statute mile is 5280 ft; the day
// is 86 400 s; the conventional inch of mercury is the pressure of a 1 in column of mercury of the
// conventional density 13 595.1 kg/m³ under standard gravity 9.806 65 m/s².
const MILE = 5280 * FOOT; // m
const DAY = 86_400; // s
const CONVENTIONAL_MERCURY_DENSITY = 13_595.1; // kg/m³
const STANDARD_GRAVITY = 9.806_65; // m/s²

const SQUARE_FOOT = FOOT ** 2;
const CUBIC_FOOT = FOOT ** 3;
const BTU_PER_HOUR = BTU / HOUR; // W
const MM2_PER_M2 = 1e6; // square millimetres in a square metre, exact

/** °F reading at 0 °C: θ_F = 1.8·θ_C + 32 (reference notes §11). */
export const FAHRENHEIT_AT_ZERO_CELSIUS = 32;

export const US_UNITS = {
  /** K per °F of temperature difference. */
  fahrenheitDegree: FAHRENHEIT_DEGREE,
  /** m */
  inch: INCH,
  /** m */
  foot: FOOT,
  /** m² */
  squareFoot: SQUARE_FOOT,
  /** W */
  btuPerHour: BTU_PER_HOUR,
  /** W/m */
  btuPerHourFoot: BTU_PER_HOUR / FOOT,
  /** W/m² */
  btuPerHourSquareFoot: BTU_PER_HOUR / SQUARE_FOOT,
  /** W/m³ */
  btuPerHourCubicFoot: BTU_PER_HOUR / CUBIC_FOOT,
  /** W/(m²·K) */
  btuPerHourSquareFootFahrenheit: BTU_PER_HOUR / (SQUARE_FOOT * FAHRENHEIT_DEGREE),
  /** W/(m·K) */
  btuPerHourFootFahrenheit: BTU_PER_HOUR / (FOOT * FAHRENHEIT_DEGREE),
  /** W/(m·K): the conductivity unit of the US insulation trade, Btu·in/(h·ft²·°F). */
  btuInchPerHourSquareFootFahrenheit: (BTU_PER_HOUR * INCH) / (SQUARE_FOOT * FAHRENHEIT_DEGREE),
  /** m²·K/W */
  hourSquareFootFahrenheitPerBtu: (SQUARE_FOOT * FAHRENHEIT_DEGREE) / BTU_PER_HOUR,
  /** m·K/W */
  hourFootFahrenheitPerBtu: (FOOT * FAHRENHEIT_DEGREE) / BTU_PER_HOUR,
  /** J */
  btu: BTU,
  /** J/m² */
  btuPerSquareFoot: BTU / SQUARE_FOOT,
  /** J/m */
  btuPerFoot: BTU / FOOT,
  /** J/(m²·K): an areal heat capacity, Btu/(ft²·°F). */
  btuPerSquareFootFahrenheit: BTU / (SQUARE_FOOT * FAHRENHEIT_DEGREE),
  /** kWh: a thousand Btu in the kilowatt-hours annual energy is stored in. */
  kiloBtuInKilowattHours: (1000 * BTU) / (1000 * HOUR),
  /** Pa */
  inchOfMercury: CONVENTIONAL_MERCURY_DENSITY * STANDARD_GRAVITY * INCH,
  /** kg/m² */
  poundPerSquareFoot: POUND / SQUARE_FOOT,
  /** kg/(m²·s) */
  poundPerSquareFootDay: POUND / SQUARE_FOOT / DAY,
  /** kg/m³ */
  poundPerCubicFoot: POUND / CUBIC_FOOT,
  /** J/(kg·K) */
  btuPerPoundFahrenheit: BTU / (POUND * FAHRENHEIT_DEGREE),
  /** m/s */
  milePerHour: MILE / HOUR,
  /** kg */
  pound: POUND,
  /** kg/s */
  poundPerHour: POUND / HOUR,
  /** kg/kWh: a pound of CO₂ per megawatt-hour, the unit of US grid emission factors. */
  poundPerMegawattHourInKilogramsPerKilowattHour: POUND / 1000,
  /** mm²/m, the unit vent openings per length are stored in: a square inch per foot of length. */
  squareInchPerFootInSquareMillimetresPerMetre: (INCH ** 2 * MM2_PER_M2) / FOOT,
  /** mm²/m², the unit vent openings per area are stored in: a square inch per square foot of area (1/144). */
  squareInchPerSquareFootInSquareMillimetresPerSquareMetre: (INCH ** 2 * MM2_PER_M2) / SQUARE_FOOT,
} as const;
