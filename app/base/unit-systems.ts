/**
 * The one conversion table between the SI values Lamina stores and the numbers a project shows:
 * SI, or US customary for a project set to 'IP'. Stored values, case files and the engine stay
 * SI; forms, results, charts and the report convert through here, by quantity kind, at the edge.
 *
 * In SI a kind shows in its unit of app/base/quantities (scaled by DISPLAY_SCALE: mm, %, …). In US
 * customary units each kind has the unit US engineers read for it (common practice, no source):
 * - temperatures in °F, affine (θ_F = 1.8·θ_C + 32); temperature differences in °F too, as the US
 *   trade writes them and as every compound unit below already does (Btu/(h·ft²·°F)), not "Δ°F";
 * - thicknesses, diameters and places through a build-up in inches, to 0.001 in (SI shows 0.1 mm;
 *   pipe outside diameters are tabulated to 0.001 in, a 5/8 in board is 0.625 in); lengths of runs
 *   in feet, areas in ft²;
 * - conductivity in Btu·in/(h·ft²·°F), the unit of US insulation data sheets; linear transmittance
 *   in Btu/(h·ft·°F);
 * - annual energy in kBtu/yr: a kBtu is of the size of the kWh it replaces (3.41 kBtu = 1 kWh), so
 *   figures keep their magnitude and 3 significant figures, and US building-energy reporting uses
 *   kBtu; MMBtu would print a wall's yearly loss as a fraction;
 * - vapour pressure in inHg (conventional): the US vapour permeance unit, the perm, is a grain per
 *   hour, square foot and inch of mercury, so US moisture calculations through a wall state vapour
 *   pressures in inHg; psi is the unit of steam and process tables, not of the envelope;
 * - s_d in feet: it is a length (the still-air layer of equal vapour resistance) and the US has no
 *   convention of its own for it, so it reads like every other length on a US page; permeance in
 *   perms would not be a conversion (it depends on the vapour permeability of air);
 * - condensate in lb/ft² and its rate in lb/(ft²·day), so a month's rate times its days gives the
 *   amount in the same unit; wind in mph;
 * - the vent opening area of a ventilated air layer in in²/ft (vertical layer) or in²/ft²
 *   (horizontal layer), the US way of stating net free vent area per length or area of a cavity;
 * - CO₂ in lb/yr, and its emission factor in lb/MWh, the unit US grid emission figures are
 *   published in; mass flow in lb/h; yearly rates in %/yr;
 * - periodic thermal transmittance and admittances (ISO 13786) in Btu/(h·ft²·°F) like a U-value, and
 *   areal heat capacity in Btu/(ft²·°F), the heat-capacity-per-area unit of US envelope data;
 * - times, relative humidity, money (never converted: its currency is the case's) and
 *   dimensionless numbers as in SI.
 * Every factor comes from app/base/us-customary-units, derived there from the exact definitions.
 */
import { DISPLAY_SCALE, QUANTITIES, type Precision, type QuantityName } from './quantities.js';
import { FAHRENHEIT_AT_ZERO_CELSIUS, US_UNITS as U } from './us-customary-units.js';

/**
 * How a project shows its numbers, spelt as projects store it (app/api/project-types UNIT_SYSTEMS):
 * 'IP' (inch-pound) is US customary. Declared here because app/base may not import app/api;
 * tests/base checks the two spellings are the same type.
 */
export type UnitSystem = 'SI' | 'IP';

interface UsCustomaryUnit {
  readonly unit: string;
  readonly precision: Precision;
  /** How many of the stored unit (app/base/quantities, before DISPLAY_SCALE) make one shown unit. */
  readonly storedPerShown: number;
  /** The shown reading when the stored value is zero: 32 for °F; zero for every other kind. */
  readonly shownAtStoredZero?: number;
}

/** A kind shown in the same unit in both systems. */
const AS_IN_SI = 'as in SI';

const sig = (significant: number): Precision => ({ significant });
const dec = (decimals: number): Precision => ({ decimals });

/** Every kind of app/base/quantities, shown in US customary units (the module comment says why). */
const US_CUSTOMARY = {
  temperature: { unit: '°F', precision: dec(1), storedPerShown: U.fahrenheitDegree, shownAtStoredZero: FAHRENHEIT_AT_ZERO_CELSIUS },
  temperatureDifference: { unit: '°F', precision: dec(1), storedPerShown: U.fahrenheitDegree },
  fluidTemperatureChange: { unit: '°F', precision: dec(2), storedPerShown: U.fahrenheitDegree },
  heatFlowPerLength: { unit: 'Btu/(h·ft)', precision: sig(3), storedPerShown: U.btuPerHourFoot },
  heatFlux: { unit: 'Btu/(h·ft²)', precision: sig(3), storedPerShown: U.btuPerHourSquareFoot },
  heatFlow: { unit: 'Btu/h', precision: sig(3), storedPerShown: U.btuPerHour },
  uValue: { unit: 'Btu/(h·ft²·°F)', precision: sig(2), storedPerShown: U.btuPerHourSquareFootFahrenheit },
  uValueUnrounded: { unit: 'Btu/(h·ft²·°F)', precision: sig(4), storedPerShown: U.btuPerHourSquareFootFahrenheit },
  linearTransmittance: { unit: 'Btu/(h·ft·°F)', precision: sig(3), storedPerShown: U.btuPerHourFootFahrenheit },
  thermalResistance: { unit: 'h·ft²·°F/Btu', precision: sig(3), storedPerShown: U.hourSquareFootFahrenheitPerBtu },
  linearThermalResistance: { unit: 'h·ft·°F/Btu', precision: sig(3), storedPerShown: U.hourFootFahrenheitPerBtu },
  conductivity: { unit: 'Btu·in/(h·ft²·°F)', precision: sig(3), storedPerShown: U.btuInchPerHourSquareFootFahrenheit },
  filmCoefficient: { unit: 'Btu/(h·ft²·°F)', precision: sig(3), storedPerShown: U.btuPerHourSquareFootFahrenheit },
  length: { unit: 'ft', precision: sig(4), storedPerShown: U.foot },
  thickness: { unit: 'in', precision: dec(3), storedPerShown: U.inch },
  diameter: { unit: 'in', precision: dec(3), storedPerShown: U.inch },
  area: { unit: 'ft²', precision: sig(4), storedPerShown: U.squareFoot },
  energyPerYear: { unit: 'kBtu/yr', precision: sig(3), storedPerShown: U.kiloBtuInKilowattHours },
  energy: { unit: 'Btu', precision: sig(4), storedPerShown: U.btu },
  vapourPressure: { unit: 'inHg', precision: dec(3), storedPerShown: U.inchOfMercury },
  equivalentAirLayerThickness: { unit: 'ft', precision: sig(3), storedPerShown: U.foot },
  massPerArea: { unit: 'lb/ft²', precision: sig(3), storedPerShown: U.poundPerSquareFoot },
  relativeHumidity: AS_IN_SI,
  temperatureFactor: AS_IN_SI,
  emissivity: AS_IN_SI,
  time: AS_IN_SI,
  hours: AS_IN_SI,
  relativeResidual: AS_IN_SI,
  count: AS_IN_SI,
  position: { unit: 'in', precision: dec(3), storedPerShown: U.inch },
  condensationRate: { unit: 'lb/(ft²·day)', precision: sig(3), storedPerShown: U.poundPerSquareFootDay },
  windSpeed: { unit: 'mph', precision: sig(2), storedPerShown: U.milePerHour },
  timeMinutes: AS_IN_SI,
  timeHours: AS_IN_SI,
  energyPerArea: { unit: 'Btu/ft²', precision: sig(4), storedPerShown: U.btuPerSquareFoot },
  energyPerLength: { unit: 'Btu/ft', precision: sig(4), storedPerShown: U.btuPerFoot },
  heatGeneration: { unit: 'Btu/(h·ft³)', precision: sig(3), storedPerShown: U.btuPerHourCubicFoot },
  density: { unit: 'lb/ft³', precision: sig(3), storedPerShown: U.poundPerCubicFoot },
  specificHeat: { unit: 'Btu/(lb·°F)', precision: sig(3), storedPerShown: U.btuPerPoundFahrenheit },
  ventOpeningPerLength: { unit: 'in²/ft', precision: sig(3), storedPerShown: U.squareInchPerFootInSquareMillimetresPerMetre },
  ventOpeningPerArea: { unit: 'in²/ft²', precision: sig(3), storedPerShown: U.squareInchPerSquareFootInSquareMillimetresPerSquareMetre },
  money: AS_IN_SI,
  moneyPerYear: AS_IN_SI,
  pricePerEnergy: AS_IN_SI,
  emissionsPerYear: { unit: 'lb/yr', precision: sig(3), storedPerShown: U.pound },
  emissionFactor: { unit: 'lb/MWh', precision: sig(3), storedPerShown: U.poundPerMegawattHourInKilogramsPerKilowattHour },
  massFlow: { unit: 'lb/h', precision: sig(3), storedPerShown: U.poundPerHour },
  ratePerYear: { unit: '%/yr', precision: sig(3), storedPerShown: 0.01 },
  factor: AS_IN_SI,
  fraction: AS_IN_SI,
  thermalAdmittance: { unit: 'Btu/(h·ft²·°F)', precision: sig(3), storedPerShown: U.btuPerHourSquareFootFahrenheit },
  decrementFactor: AS_IN_SI,
  arealHeatCapacity: { unit: 'Btu/(ft²·°F)', precision: sig(3), storedPerShown: U.btuPerSquareFootFahrenheit },
} as const satisfies Record<QuantityName, UsCustomaryUnit | typeof AS_IN_SI>;

/** The US unit of a kind, or null where the kind shows as in SI. */
function usUnit(quantity: QuantityName, system: UnitSystem): UsCustomaryUnit | null {
  if (system === 'SI') return null;
  const entry: UsCustomaryUnit | typeof AS_IN_SI = US_CUSTOMARY[quantity];
  return entry === AS_IN_SI ? null : entry;
}

/** A conversion that overflowed or was given NaN or ±∞ is a bug upstream: inputs are checked before they get here. */
function finite(value: number, input: number, quantity: QuantityName, direction: string): number {
  if (!Number.isFinite(value)) throw new Error(`Converting the ${quantity} ${String(input)} ${direction} gave ${String(value)}: only finite values within the documented ranges may be converted.`);
  return value;
}

/** The stored SI value as the project shows it: 50 (°C) reads 122 in 'IP', 0.05 (m of thickness) reads 50 in 'SI'. */
export function toDisplay(value: number, quantity: QuantityName, system: UnitSystem): number {
  const us = usUnit(quantity, system);
  const shown = us === null ? value * (DISPLAY_SCALE[quantity] ?? 1) : value / us.storedPerShown + (us.shownAtStoredZero ?? 0);
  return finite(shown, value, quantity, `to ${system} units`);
}

/** A value as shown (or typed) in the project's units, back to the SI value that is stored. */
export function fromDisplay(value: number, quantity: QuantityName, system: UnitSystem): number {
  const us = usUnit(quantity, system);
  const stored = us === null ? value / (DISPLAY_SCALE[quantity] ?? 1) : (value - (us.shownAtStoredZero ?? 0)) * us.storedPerShown;
  return finite(stored, value, quantity, `from ${system} units`);
}

/** The unit a kind shows with in the system ("°F", "Btu/(h·ft)"); empty for a dimensionless number. */
export function unitLabel(quantity: QuantityName, system: UnitSystem): string {
  return usUnit(quantity, system)?.unit ?? QUANTITIES[quantity].unit;
}

/** The precision a kind is printed with in the system. */
export function displayPrecision(quantity: QuantityName, system: UnitSystem): Precision {
  return usUnit(quantity, system)?.precision ?? QUANTITIES[quantity].precision;
}
