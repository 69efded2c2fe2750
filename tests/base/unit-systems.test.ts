/**
 * The unit table of app/base/unit-systems: every kind round-trips stored SI → shown → stored SI,
 * temperatures meet the fixed points of the two scales, dimensionless kinds are untouched, and
 * formatQuantity writes US customary figures. The factors themselves are checked against NIST SP
 * 811 in us-customary-units.test.ts.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DISPLAY_SCALE, QUANTITIES, type QuantityName } from '../../app/base/quantities.js';
import { displayPrecision, fromDisplay, toDisplay, unitLabel, type UnitSystem } from '../../app/base/unit-systems.js';
import { UNIT_SYSTEMS, type UnitSystem as StoredUnitSystem } from '../../app/api/project-types.js';
import { formatQuantity, formatQuantityNumber, quantityUnit } from '../../app/report/format-quantity.js';

const KINDS = Object.keys(QUANTITIES) as QuantityName[];
const SYSTEMS: readonly UnitSystem[] = ['SI', 'IP'];
const ROUND_TRIP = 1e-12;

/** Values from 1e-12 to 1e13 in magnitude, of either sign, and zero. */
const spread = fc.oneof(
  fc.constant(0),
  fc
    .tuple(fc.double({ min: 1, max: 10, noNaN: true }), fc.integer({ min: -12, max: 12 }), fc.boolean())
    .map(([mantissa, exponent, negative]) => (negative ? -1 : 1) * mantissa * 10 ** exponent),
);

/** From 1 K above absolute zero to the engine's largest temperature (app/base/quantity-ranges), 1e7 °C. */
const celsius = fc.oneof(fc.double({ min: -272.15, max: 1e7, noNaN: true }), fc.double({ min: -272.15, max: 1000, noNaN: true }));

/**
 * °C and °F share no zero, so the error of a temperature is measured relative to the absolute
 * temperature θ + 273.15 K: a relative error in °C is undefined at 0 °C, where the 32 °F offset
 * alone leaves a round-off of about 1e-15 K.
 */
const scaleOf = (quantity: QuantityName, stored: number) => (quantity === 'temperature' ? stored + 273.15 : Math.abs(stored));

type Equal<A, B> = (<T>() => T extends A ? 1 : 2) extends <T>() => T extends B ? 1 : 2 ? true : false;

describe('the unit systems', () => {
  it('are spelt as projects store them', () => {
    const sameType: Equal<UnitSystem, StoredUnitSystem> = true;
    expect(sameType).toBe(true);
    expect(UNIT_SYSTEMS.map((system) => unitLabel('temperature', system))).toEqual(['°C', '°F']);
  });

  it('every kind round-trips stored SI → shown → stored SI to 1e-12 relative, in both systems', () => {
    for (const system of SYSTEMS) {
      for (const quantity of KINDS) {
        fc.assert(
          fc.property(quantity === 'temperature' ? celsius : spread, (stored) => {
            const back = fromDisplay(toDisplay(stored, quantity, system), quantity, system);
            expect(Math.abs(back - stored), `${quantity} ${stored} in ${system}`).toBeLessThanOrEqual(ROUND_TRIP * scaleOf(quantity, stored));
          }),
          { numRuns: 200 },
        );
      }
    }
  });

  it('a value typed in US units comes back as typed once stored', () => {
    for (const quantity of KINDS) {
      fc.assert(
        fc.property(quantity === 'temperature' ? celsius : spread, (stored) => {
          const shown = toDisplay(stored, quantity, 'IP');
          const again = toDisplay(fromDisplay(shown, quantity, 'IP'), quantity, 'IP');
          const scale = quantity === 'temperature' ? shown + 459.67 : Math.abs(shown); // °F above absolute zero
          expect(Math.abs(again - shown), `${quantity} ${shown}`).toBeLessThanOrEqual(ROUND_TRIP * scale);
        }),
        { numRuns: 100 },
      );
    }
  });

  it('°F meets °C at −40, 0 °C is 32 °F and 100 °C is 212 °F', () => {
    // Fixed points of the two scales: θ_F = 1.8·θ_C + 32 (reference notes §11; NIST SP 811 B.9).
    for (const [c, f] of [[-40, -40], [0, 32], [100, 212], [-273.15, -459.67], [50, 122]] as const) {
      expect(toDisplay(c, 'temperature', 'IP')).toBeCloseTo(f, 12);
      expect(fromDisplay(f, 'temperature', 'IP')).toBeCloseTo(c, 12);
    }
    // A difference has no offset: 100 K between the fixed points is 180 °F.
    expect(toDisplay(100, 'temperatureDifference', 'IP')).toBeCloseTo(180, 12);
    expect(toDisplay(0, 'temperatureDifference', 'IP')).toBe(0);
  });

  it('SI shows each kind in its own unit, scaled as before', () => {
    for (const quantity of KINDS) {
      expect(unitLabel(quantity, 'SI')).toBe(QUANTITIES[quantity].unit);
      expect(displayPrecision(quantity, 'SI')).toEqual(QUANTITIES[quantity].precision);
      expect(toDisplay(0.37, quantity, 'SI')).toBe(0.37 * (DISPLAY_SCALE[quantity] ?? 1));
    }
  });

  it('times, humidity and dimensionless numbers read alike in both systems', () => {
    const alike: QuantityName[] = ['relativeHumidity', 'temperatureFactor', 'emissivity', 'relativeResidual', 'count', 'time', 'hours', 'timeMinutes', 'timeHours', 'money', 'moneyPerYear', 'pricePerEnergy', 'factor', 'decrementFactor'];
    for (const quantity of alike) {
      expect(unitLabel(quantity, 'IP')).toBe(unitLabel(quantity, 'SI'));
      expect(toDisplay(0.85, quantity, 'IP')).toBe(toDisplay(0.85, quantity, 'SI'));
    }
    expect(toDisplay(0.85, 'relativeHumidity', 'IP')).toBe(85);
  });

  it('names the US customary unit of every other kind', () => {
    const labels = Object.fromEntries(KINDS.filter((q) => unitLabel(q, 'IP') !== unitLabel(q, 'SI')).map((q) => [q, unitLabel(q, 'IP')]));
    expect(labels).toEqual({
      temperature: '°F',
      temperatureDifference: '°F',
      fluidTemperatureChange: '°F',
      heatFlowPerLength: 'Btu/(h·ft)',
      heatFlux: 'Btu/(h·ft²)',
      heatFlow: 'Btu/h',
      uValue: 'Btu/(h·ft²·°F)',
      uValueUnrounded: 'Btu/(h·ft²·°F)',
      linearTransmittance: 'Btu/(h·ft·°F)',
      thermalResistance: 'h·ft²·°F/Btu',
      linearThermalResistance: 'h·ft·°F/Btu',
      conductivity: 'Btu·in/(h·ft²·°F)',
      filmCoefficient: 'Btu/(h·ft²·°F)',
      length: 'ft',
      thickness: 'in',
      diameter: 'in',
      area: 'ft²',
      energyPerYear: 'kBtu/yr',
      energy: 'Btu',
      vapourPressure: 'inHg',
      equivalentAirLayerThickness: 'ft',
      massPerArea: 'lb/ft²',
      position: 'in',
      condensationRate: 'lb/(ft²·day)',
      windSpeed: 'mph',
      energyPerArea: 'Btu/ft²',
      energyPerLength: 'Btu/ft',
      heatGeneration: 'Btu/(h·ft³)',
      density: 'lb/ft³',
      specificHeat: 'Btu/(lb·°F)',
      ventOpeningPerLength: 'in²/ft',
      ventOpeningPerArea: 'in²/ft²',
      emissionsPerYear: 'lb/yr',
      emissionFactor: 'lb/MWh',
      massFlow: 'lb/h',
      ratePerYear: '%/yr',
      thermalAdmittance: 'Btu/(h·ft²·°F)',
      arealHeatCapacity: 'Btu/(ft²·°F)',
    });
  });

  it('refuses a value that is not finite, or overflows, instead of passing NaN on', () => {
    expect(() => toDisplay(Number.NaN, 'temperature', 'IP')).toThrow('Converting the temperature NaN to IP units gave NaN: only finite values within the documented ranges may be converted.');
    expect(() => fromDisplay(Infinity, 'heatFlux', 'SI')).toThrow(/heatFlux Infinity from SI units/);
    expect(() => toDisplay(1e307, 'thickness', 'IP')).toThrow(/thickness 1e\+307 to IP units gave Infinity/);
  });
});

describe('formatQuantity in a project unit system', () => {
  // Expected figures worked by hand with the NIST SP 811 (2008) Appendix B factors of
  // us-customary-units.test.ts, then rounded to the kind's US precision.
  it('writes US customary figures with their units', () => {
    expect(formatQuantity(50, 'temperature', 'IP')).toBe('122.0 °F'); // 1.8·50 + 32
    expect(formatQuantity(-40, 'temperature', 'IP')).toBe('−40.0 °F');
    expect(formatQuantity(-17.5, 'temperature', 'IP')).toBe('0.5 °F');
    expect(formatQuantity(10, 'temperatureDifference', 'IP')).toBe('18.0 °F');
    expect(formatQuantity(0.05, 'thickness', 'IP')).toBe('1.969 in'); // 50 mm / 25.4
    expect(formatQuantity(0.1143, 'diameter', 'IP')).toBe('4.500 in'); // 114.3 mm / 25.4
    expect(formatQuantity(53.2149, 'heatFlowPerLength', 'IP')).toBe('55.3 Btu/(h·ft)'); // / 0.9615193
    expect(formatQuantity(1234.5, 'heatFlow', 'IP')).toBe('4210 Btu/h'); // / 0.2930711 = 4212.3
    expect(formatQuantity(0.2842, 'uValue', 'IP')).toBe('0.050 Btu/(h·ft²·°F)'); // / 5.678263 = 0.05005
    expect(formatQuantity(0.04, 'conductivity', 'IP')).toBe('0.277 Btu·in/(h·ft²·°F)'); // / 0.1442279
    expect(formatQuantity(1, 'thermalResistance', 'IP')).toBe('5.68 h·ft²·°F/Btu'); // / 0.1761102
    expect(formatQuantity(2339, 'vapourPressure', 'IP')).toBe('0.691 inHg'); // / 3386.389
    expect(formatQuantity(1000, 'energyPerYear', 'IP')).toBe('3410 kBtu/yr'); // 3.6e9 J / 1055.056e3 J
    expect(formatQuantity(100, 'length', 'IP')).toBe('328.1 ft'); // / 0.3048
    expect(formatQuantity(10, 'area', 'IP')).toBe('107.6 ft²'); // / 0.09290304
    expect(formatQuantity(0.5, 'massPerArea', 'IP')).toBe('0.102 lb/ft²'); // / 4.882428
    expect(formatQuantity(5, 'windSpeed', 'IP')).toBe('11 mph'); // / 0.44704
    expect(formatQuantity(1000, 'density', 'IP')).toBe('62.4 lb/ft³'); // / 16.01846
  });

  it('leaves dimensionless figures and "not applicable" as they are', () => {
    expect(formatQuantity(0.85, 'relativeHumidity', 'IP')).toBe('85 %');
    expect(formatQuantity(0.9, 'emissivity', 'IP')).toBe('0.90');
    expect(formatQuantity(null, 'temperature', 'IP')).toBe('—');
    expect(formatQuantityNumber(50, 'temperature', 'IP')).toBe('122.0');
    expect(quantityUnit('conductivity', 'IP')).toBe('Btu·in/(h·ft²·°F)');
  });

  it('writes SI as before when SI is given (tests/report/format-quantity.test.ts holds the default)', () => {
    expect(formatQuantity(18.6349, 'temperature', 'SI')).toBe('18.6 °C');
    expect(formatQuantity(0.05, 'thickness', 'SI')).toBe('50.0 mm');
  });
});
