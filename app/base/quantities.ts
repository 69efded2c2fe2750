/**
 * The kinds of quantity Lamina shows, each with its SI unit label and the precision a figure of
 * that kind is printed with. Values stay SI everywhere inside; a rendering (text, screen, paper)
 * looks the unit and precision up here by kind, so a heat flow reads alike in every output, and
 * app/base/unit-systems gives each kind its US customary unit and conversion in one place.
 *
 * Precision is common practice, no source: temperatures to 0.1 K (what surface thermometers and
 * the inputs justify), heat flows to 3 significant figures, U-values to the 2 significant figures
 * ISO 6946 asks for in final results (from memory) with 4 beside them.
 */
export type Precision = { readonly decimals: number } | { readonly significant: number };

export interface QuantityKind {
  /** SI unit as printed ("W/(m·K)"); empty for a dimensionless number. */
  readonly unit: string;
  readonly precision: Precision;
}

export const QUANTITIES = {
  temperature: { unit: '°C', precision: { decimals: 1 } },
  temperatureDifference: { unit: 'K', precision: { decimals: 1 } },
  /** A fluid's change of temperature along a run: often a few tenths of a kelvin, against a limit of as little. */
  fluidTemperatureChange: { unit: 'K', precision: { decimals: 2 } },
  heatFlowPerLength: { unit: 'W/m', precision: { significant: 3 } },
  heatFlux: { unit: 'W/m²', precision: { significant: 3 } },
  heatFlow: { unit: 'W', precision: { significant: 3 } },
  uValue: { unit: 'W/(m²·K)', precision: { significant: 2 } },
  uValueUnrounded: { unit: 'W/(m²·K)', precision: { significant: 4 } },
  linearTransmittance: { unit: 'W/(m·K)', precision: { significant: 3 } },
  thermalResistance: { unit: 'm²·K/W', precision: { significant: 3 } },
  linearThermalResistance: { unit: 'm·K/W', precision: { significant: 3 } },
  conductivity: { unit: 'W/(m·K)', precision: { significant: 3 } },
  filmCoefficient: { unit: 'W/(m²·K)', precision: { significant: 3 } },
  length: { unit: 'm', precision: { significant: 4 } },
  thickness: { unit: 'mm', precision: { decimals: 1 } },
  diameter: { unit: 'mm', precision: { decimals: 1 } },
  area: { unit: 'm²', precision: { significant: 4 } },
  energyPerYear: { unit: 'kWh/a', precision: { significant: 3 } },
  energy: { unit: 'J', precision: { significant: 4 } },
  vapourPressure: { unit: 'Pa', precision: { decimals: 0 } },
  equivalentAirLayerThickness: { unit: 'm', precision: { significant: 3 } },
  massPerArea: { unit: 'kg/m²', precision: { significant: 3 } },
  relativeHumidity: { unit: '%', precision: { decimals: 0 } },
  temperatureFactor: { unit: '', precision: { decimals: 3 } },
  emissivity: { unit: '', precision: { decimals: 2 } },
  time: { unit: 's', precision: { significant: 4 } },
  hours: { unit: 'h', precision: { significant: 4 } },
  relativeResidual: { unit: '', precision: { significant: 2 } },
  count: { unit: '', precision: { decimals: 0 } },
  /** A place through a build-up (distance from a face, or a radius), stored in m, read in mm. */
  position: { unit: 'mm', precision: { decimals: 1 } },
  /** Condensation or evaporation rate, stored in kg/(m²·s), read per day. */
  condensationRate: { unit: 'g/(m²·day)', precision: { significant: 3 } },
  windSpeed: { unit: 'm/s', precision: { significant: 2 } },
  /** Elapsed time of a transient run, stored in s, read in minutes or hours (the report picks by duration). */
  timeMinutes: { unit: 'min', precision: { decimals: 1 } },
  timeHours: { unit: 'h', precision: { decimals: 2 } },
  /** Heat stored or delivered, stored in J per m² (planar) or per metre (pipe), read in kJ. */
  energyPerArea: { unit: 'kJ/m²', precision: { significant: 4 } },
  energyPerLength: { unit: 'kJ/m', precision: { significant: 4 } },
  /** Volumetric heat generation. */
  heatGeneration: { unit: 'W/m³', precision: { significant: 3 } },
  /** A material's density and specific heat capacity (library, transient layers). */
  density: { unit: 'kg/m³', precision: { significant: 3 } },
  specificHeat: { unit: 'J/(kg·K)', precision: { significant: 3 } },
  /**
   * The vent opening area A_v of a ventilated air layer (ISO 6946), stored as the standard states
   * it: mm² per metre of length for a vertical layer, mm² per m² of area for a horizontal one.
   * The two are different quantities (an area per length, a ratio of areas), so each has its kind.
   */
  ventOpeningPerLength: { unit: 'mm²/m', precision: { decimals: 0 } },
  ventOpeningPerArea: { unit: 'mm²/m²', precision: { decimals: 0 } },
  /**
   * Sizing (app/cases/sizing). Money is in the currency the case's economics name and is never
   * converted, so its kinds carry no unit: a label names the currency. Costs to 4 significant
   * figures, so that neighbouring thicknesses' lifecycle costs still differ in print.
   */
  money: { unit: '', precision: { significant: 4 } },
  moneyPerYear: { unit: '', precision: { significant: 4 } },
  /** A price per kWh of energy, in the currency of the economics. */
  pricePerEnergy: { unit: '', precision: { significant: 3 } },
  /** kg of CO₂ emitted per year, and per kWh of fuel or electricity. */
  emissionsPerYear: { unit: 'kg/a', precision: { significant: 3 } },
  emissionFactor: { unit: 'kg/kWh', precision: { significant: 3 } },
  massFlow: { unit: 'kg/s', precision: { significant: 3 } },
  /** A yearly rate (escalation, discount), stored as a fraction, read in per cent. */
  ratePerYear: { unit: '%/a', precision: { significant: 3 } },
  /** A dimensionless multiplier (present-value and annuity factors, an efficiency or COP). */
  factor: { unit: '', precision: { significant: 4 } },
  /** A part of a whole (the frozen fraction of a pipe's water), stored as a fraction, read in per cent. */
  fraction: { unit: '%', precision: { decimals: 0 } },
  /**
   * Dynamic thermal characteristics (ISO 13786): a periodic thermal transmittance or admittance
   * (complex amplitude ratio, shown as its modulus), the decrement factor |Y_ie|/U, and an areal
   * heat capacity, stored in J/(m²·K) and read in kJ/(m²·K) as the standard states it. Their time
   * shifts are timeHours.
   */
  thermalAdmittance: { unit: 'W/(m²·K)', precision: { significant: 3 } },
  decrementFactor: { unit: '', precision: { decimals: 3 } },
  arealHeatCapacity: { unit: 'kJ/(m²·K)', precision: { significant: 3 } },
} as const satisfies Record<string, QuantityKind>;

export type QuantityName = keyof typeof QUANTITIES;

/**
 * Factor from the SI base a value is stored in to the unit the kind prints with, where the two
 * differ: thicknesses, diameters and positions are stored in metres and read in millimetres;
 * relative humidity is stored as a fraction and read in per cent; condensation rates are stored
 * per second and read in grams per day; elapsed times are read in minutes or hours and stored
 * heat in kilojoules.
 */
export const DISPLAY_SCALE: Partial<Record<QuantityName, number>> = {
  thickness: 1000,
  diameter: 1000,
  position: 1000,
  relativeHumidity: 100,
  condensationRate: 86_400 * 1000,
  timeMinutes: 1 / 60,
  timeHours: 1 / 3600,
  energyPerArea: 1e-3,
  energyPerLength: 1e-3,
  ratePerYear: 100,
  fraction: 100,
  arealHeatCapacity: 1e-3,
};
