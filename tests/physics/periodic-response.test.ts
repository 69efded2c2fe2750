/**
 * The ISO 13786 transfer-matrix method (app/physics/periodic-response.ts) against:
 * - worked cases computed by hand from the formulas of ISO 13786:2017 (clause 6: the layer matrix,
 *   the surface and air-layer matrices, the product from the outside to the inside, and the
 *   characteristics read from it), for a 24 h period. The figures below were worked out from those
 *   formulas with a calculator (plain floating point, not this module) and are written out; the
 *   test recomputes each step with plain Math and then compares the module with the written figures;
 * - the exact periodic solutions of the heat equation: a layer many penetration depths thick acts
 *   as a semi-infinite solid whose surface admittance is √(ωρcλ)·e^{iπ/4} and through which a wave
 *   is damped as e^{−ξ} and delayed by ξ radians (Carslaw & Jaeger, Conduction of Heat in Solids,
 *   2nd ed., §2.6, periodic surface temperature);
 * - limits and identities: the steady limit T → ∞ (Y_ie → U, κ₁ + κ₂ → Σρcd), a thin light layer
 *   (decrement factor near 1, time shift near 0), det Z = 1, and reciprocity (reversing the layers
 *   keeps Y_ie and swaps the two sides).
 * The transient finite-element cross-check is in periodic-response-fe.test.ts.
 */
import { describe, expect, it } from 'vitest';
import { complex, multiply, subtract, type Complex } from '../../app/physics/complex-number.js';
import { layerMatrix, type HeatTransferMatrix } from '../../app/physics/heat-transfer-matrix.js';
import { InputError, periodicResponse, type PeriodicElement, type PeriodicLayer } from '../../app/physics/index.js';
import { thrownBy } from './thrown-error.js';

const DAY = 86_400;
const RSI = 0.13;
const RSE = 0.04;

/** Relative closeness of two complex numbers. */
function expectComplex(actual: Complex, expected: Complex, relative: number): void {
  const scale = Math.hypot(expected.re, expected.im);
  expect(Math.hypot(actual.re - expected.re, actual.im - expected.im) / scale).toBeLessThan(relative);
}

function expectMatrix(actual: HeatTransferMatrix, expected: HeatTransferMatrix, relative: number): void {
  expectComplex(actual.z11, expected.z11, relative);
  expectComplex(actual.z12, expected.z12, relative);
  expectComplex(actual.z21, expected.z21, relative);
  expectComplex(actual.z22, expected.z22, relative);
}

const determinant = (z: HeatTransferMatrix): Complex => subtract(multiply(z.z11, z.z22), multiply(z.z12, z.z21));

// High-density concrete (reference notes §5.1: ISO 10456 generic values, from memory) and EPS.
const concrete: PeriodicLayer = { kind: 'material', thickness: 0.2, conductivity: 2.0, density: 2400, specificHeat: 1000 };
const eps: PeriodicLayer = { kind: 'material', thickness: 0.1, conductivity: 0.035, density: 20, specificHeat: 1450 };

describe('worked case 1: 200 mm concrete (λ 2.0, ρ 2400, c 1000) with R_si 0.13 and R_se 0.04, 24 h (ISO 13786:2017)', () => {
  // By hand, ISO 13786:2017 clause 6:
  //   δ = √(λT/(πρc)) = √(2.0·86400/(π·2400·1000)) = 0.15138795 m
  //   ξ = d/δ = 0.2/0.15138795 = 1.3211091
  //   cosh ξ = 2.0059, sinh ξ = 1.7386, cos ξ = 0.24726, sin ξ = 0.96895
  //   Z₁₁ = Z₂₂ = cosh ξ cos ξ + i sinh ξ sin ξ                                   = 0.49598274 + 1.6863989i
  //   Z₁₂ = −(δ/2λ)[sinh ξ cos ξ + cosh ξ sin ξ + i(cosh ξ sin ξ − sinh ξ cos ξ)]  = −0.089886970 − 0.057335038i m²K/W
  //   Z₂₁ = −(λ/δ)[sinh ξ cos ξ − cosh ξ sin ξ + i(sinh ξ cos ξ + cosh ξ sin ξ)]  = 20.013704 − 31.376472i W/(m²K)
  // Element Z = Z_se·Z·Z_si with Z_s = [[1, −R_s], [0, 1]]:
  //   E₁₁ = Z₁₁ − R_se Z₂₁                      = −0.30456542 + 2.9414578i
  //   E₁₂ = Z₁₂ − R_si Z₁₁ − R_se(Z₂₂ − R_si Z₂₁) = −0.070132775 − 0.50718051i
  //   E₂₁ = Z₂₁;  E₂₂ = Z₂₂ − R_si Z₂₁            = −2.1057988 + 5.7653402i
  // Characteristics:
  //   U = 1/(0.13 + 0.1 + 0.04) = 3.7037037 W/(m²K)
  //   Y_ie = −1/E₁₂: |Y_ie| = 1.9531001 W/(m²K), arg = −1.4333880 rad → Δt = −5.4751389 h; f = 0.52733704
  //   Y_ii = −E₁₁/E₁₂: 5.7756754 W/(m²K), Δt = +0.91895938 h;  Y_ee = −E₂₂/E₁₂: 11.987889 W/(m²K), Δt = +1.8625140 h
  //   κ₁ = (T/2π)|(E₁₁ − 1)/E₁₂| = 86.419913 kJ/(m²K);  κ₂ = (T/2π)|(E₂₂ − 1)/E₁₂| = 175.87810 kJ/(m²K)
  const layerByHand: HeatTransferMatrix = {
    z11: complex(0.49598274, 1.6863989),
    z12: complex(-0.08988697, -0.057335038),
    z21: complex(20.013704, -31.376472),
    z22: complex(0.49598274, 1.6863989),
  };
  const elementByHand: HeatTransferMatrix = {
    z11: complex(-0.30456542, 2.9414578),
    z12: complex(-0.070132775, -0.50718051),
    z21: complex(20.013704, -31.376472),
    z22: complex(-2.1057988, 5.7653402),
  };

  it('δ, ξ and the layer matrix, step by step with plain Math, give the written figures', () => {
    const delta = Math.sqrt((2.0 * DAY) / (Math.PI * 2400 * 1000));
    const xi = 0.2 / delta;
    expect(delta).toBeCloseTo(0.15138795, 8);
    expect(xi).toBeCloseTo(1.3211091, 7);
    const [ch, sh, c, s] = [Math.cosh(xi), Math.sinh(xi), Math.cos(xi), Math.sin(xi)];
    const byMath: HeatTransferMatrix = {
      z11: complex(ch * c, sh * s),
      z12: complex((-delta / 4) * (sh * c + ch * s), (-delta / 4) * (ch * s - sh * c)),
      z21: complex((-2 / delta) * (sh * c - ch * s), (-2 / delta) * (sh * c + ch * s)),
      z22: complex(ch * c, sh * s),
    };
    expectMatrix(byMath, layerByHand, 1e-7);
  });

  it('the module reproduces the layer matrix, the element matrix and every characteristic', () => {
    expectMatrix(layerMatrix(concrete as PeriodicLayer & { kind: 'material' }, DAY), layerByHand, 1e-7);
    const r = periodicResponse({ layers: [concrete], insideSurfaceResistance: RSI, outsideSurfaceResistance: RSE });
    expectMatrix(r.matrix, elementByHand, 1e-7);
    expect(r.period).toBe(DAY);
    expect(r.uValue).toBeCloseTo(3.7037037, 6);
    expect(r.periodicTransmittance.amplitude).toBeCloseTo(1.9531001, 6);
    expect(r.periodicTransmittance.timeShift / 3600).toBeCloseTo(-5.4751389, 6);
    expect(r.decrementFactor).toBeCloseTo(0.52733704, 7);
    expect(r.insideAdmittance.amplitude).toBeCloseTo(5.7756754, 6);
    expect(r.insideAdmittance.timeShift / 3600).toBeCloseTo(0.91895938, 6);
    expect(r.outsideAdmittance.amplitude).toBeCloseTo(11.987889, 5);
    expect(r.outsideAdmittance.timeShift / 3600).toBeCloseTo(1.862514, 6);
    expect(r.insideArealHeatCapacity / 1000).toBeCloseTo(86.419913, 5);
    expect(r.outsideArealHeatCapacity / 1000).toBeCloseTo(175.8781, 4);
  });
});

describe('worked case 2: the same concrete inside 100 mm EPS (λ 0.035, ρ 20, c 1450), 24 h (ISO 13786:2017)', () => {
  // By hand, as in case 1; layer 1 (concrete, inside) as there, layer 2 (EPS, outside):
  //   δ₂ = √(0.035·86400/(π·20·1450)) = 0.18218682 m, ξ₂ = 0.1/δ₂ = 0.54888712
  //   Z₁₁ = Z₂₂ = 0.98487529 + 0.30097325i;  Z₁₂ = −2.8484993 − 0.28680653i;  Z₂₁ = 0.021170017 − 0.21025595i
  // Element Z = Z_se·Z_EPS·Z_concrete·Z_si:
  //   E₁₁ = −67.207862 + 86.443844i;  E₁₂ = 7.7379361 − 16.340293i;  E₂₁ = 29.519556 − 24.946904i;  E₂₂ = −3.8705801 + 5.0709532i
  // Characteristics:
  //   U = 1/(0.13 + 0.1 + 2.8571429 + 0.04) = 0.31978072 W/(m²K)
  //   |Y_ie| = 0.055310207 W/(m²K), arg −2.0130605 rad → Δt = −7.6893245 h; f = 0.17296292
  //   Y_ii 6.0562617 W/(m²K), Δt +0.83495185 h;  Y_ee 0.35284252 W/(m²K), Δt +0.80093771 h
  //   κ₁ = 83.748561 kJ/(m²K);  κ₂ = 5.3476838 kJ/(m²K)
  it('δ₂, ξ₂ and the EPS layer matrix with plain Math', () => {
    const delta = Math.sqrt((0.035 * DAY) / (Math.PI * 20 * 1450));
    const xi = 0.1 / delta;
    expect(delta).toBeCloseTo(0.18218682, 8);
    expect(xi).toBeCloseTo(0.54888712, 8);
    const [ch, sh, c, s] = [Math.cosh(xi), Math.sinh(xi), Math.cos(xi), Math.sin(xi)];
    const f12 = -delta / (2 * 0.035);
    const f21 = -0.035 / delta;
    expectComplex(complex(ch * c, sh * s), complex(0.98487529, 0.30097325), 1e-7);
    expectComplex(complex(f12 * (sh * c + ch * s), f12 * (ch * s - sh * c)), complex(-2.8484993, -0.28680653), 1e-7);
    expectComplex(complex(f21 * (sh * c - ch * s), f21 * (sh * c + ch * s)), complex(0.021170017, -0.21025595), 1e-7);
  });

  it('the module reproduces the element matrix and every characteristic', () => {
    const r = periodicResponse({ layers: [concrete, eps], insideSurfaceResistance: RSI, outsideSurfaceResistance: RSE });
    expectMatrix(
      r.matrix,
      { z11: complex(-67.207862, 86.443844), z12: complex(7.7379361, -16.340293), z21: complex(29.519556, -24.946904), z22: complex(-3.8705801, 5.0709532) },
      1e-7,
    );
    expect(r.uValue).toBeCloseTo(0.31978072, 8);
    expect(r.periodicTransmittance.amplitude).toBeCloseTo(0.055310207, 8);
    expect(r.periodicTransmittance.timeShift / 3600).toBeCloseTo(-7.6893245, 6);
    expect(r.decrementFactor).toBeCloseTo(0.17296292, 7);
    expect(r.insideAdmittance.amplitude).toBeCloseTo(6.0562617, 6);
    expect(r.insideAdmittance.timeShift / 3600).toBeCloseTo(0.83495185, 6);
    expect(r.outsideAdmittance.amplitude).toBeCloseTo(0.35284252, 7);
    expect(r.outsideAdmittance.timeShift / 3600).toBeCloseTo(0.80093771, 6);
    expect(r.insideArealHeatCapacity / 1000).toBeCloseTo(83.748561, 5);
    expect(r.outsideArealHeatCapacity / 1000).toBeCloseTo(5.3476838, 6);
  });

  it('an air layer enters as a pure resistance: the same as the resistance added to a film', () => {
    // Z_R·Z_se-type products commute for pure resistances in series: R_g next to the outside film
    // is the same as R_se + R_g (an identity of the method, no source needed).
    const withAir = periodicResponse({ layers: [concrete, eps, { kind: 'resistance', resistance: 0.18 }], insideSurfaceResistance: RSI, outsideSurfaceResistance: RSE });
    const merged = periodicResponse({ layers: [concrete, eps], insideSurfaceResistance: RSI, outsideSurfaceResistance: RSE + 0.18 });
    expectMatrix(withAir.matrix, merged.matrix, 1e-12);
    expect(withAir.uValue).toBeCloseTo(1 / (RSI + 0.1 + 0.1 / 0.035 + 0.18 + RSE), 12);
  });
});

describe('exact periodic solutions (Carslaw & Jaeger §2.6) and limits', () => {
  it('a layer 12 penetration depths thick, no films: surface admittance √(ωρcλ)·e^{iπ/4} (time shift +T/8), wave damped e^{−ξ} and delayed ξ rad', () => {
    const delta = Math.sqrt((2.0 * DAY) / (Math.PI * 2400 * 1000));
    const thick = { ...concrete, thickness: 12 * delta };
    const r = periodicResponse({ layers: [thick], insideSurfaceResistance: 0, outsideSurfaceResistance: 0 });
    const effusivityAdmittance = Math.sqrt(((2 * Math.PI) / DAY) * 2400 * 1000 * 2.0); // = λ√2/δ
    expect(r.insideAdmittance.amplitude / effusivityAdmittance - 1).toBeLessThan(1e-9);
    expect(r.insideAdmittance.timeShift / (DAY / 8) - 1).toBeLessThan(1e-9);
    expect(r.outsideAdmittance.amplitude / effusivityAdmittance - 1).toBeLessThan(1e-9);
    // Y₁₂ = λk/sinh(kd) → 2λk·e^{−kd}, k = (1 + i)/δ: |Y₁₂| = 2√2(λ/δ)e^{−ξ}, arg = π/4 − ξ.
    const xi = 12;
    expect(r.periodicTransmittance.amplitude / (2 * Math.SQRT2 * (2.0 / delta) * Math.exp(-xi)) - 1).toBeLessThan(1e-9);
    const expectedShift = ((Math.PI / 4 - xi) * DAY) / (2 * Math.PI);
    expect(Math.abs(r.periodicTransmittance.timeShift - expectedShift)).toBeLessThan(1e-6);
    // A lag of 1.75 days: the phase is followed past −π several times, not folded back.
    expect(r.periodicTransmittance.timeShift / DAY).toBeCloseTo((Math.PI / 4 - 12) / (2 * Math.PI), 9);
  });

  it('the steady limit T → ∞: Y_ie → U with no time shift, f → 1, Y_ii and Y_ee → U, κ₁ + κ₂ → Σρcd', () => {
    const element: PeriodicElement = { layers: [concrete, eps], insideSurfaceResistance: RSI, outsideSurfaceResistance: RSE };
    const r = periodicResponse(element, 1e5 * DAY);
    expect(Math.abs(r.periodicTransmittance.amplitude / r.uValue - 1)).toBeLessThan(1e-6);
    expect(Math.abs(r.decrementFactor - 1)).toBeLessThan(1e-6);
    expect(Math.abs(r.periodicTransmittance.timeShift / r.period)).toBeLessThan(1e-4);
    expect(Math.abs(r.insideAdmittance.amplitude / r.uValue - 1)).toBeLessThan(1e-4);
    expect(Math.abs(r.outsideAdmittance.amplitude / r.uValue - 1)).toBeLessThan(1e-4);
    // At low frequency all the element's capacity takes part: the heat stored per kelvin of a
    // common swing on both sides enters from one side or the other (κ₁ + κ₂ = Σρcd in the limit).
    const capacity = 0.2 * 2400 * 1000 + 0.1 * 20 * 1450;
    expect(Math.abs((r.insideArealHeatCapacity + r.outsideArealHeatCapacity) / capacity - 1)).toBeLessThan(1e-4);
    // And U itself is 1/R_T.
    expect(r.uValue).toBeCloseTo(1 / (RSI + 0.1 + 0.1 / 0.035 + RSE), 12);
  });

  it('a thin, light layer (20 mm mineral wool, ρ 30): decrement factor near 1 and a time shift of about a minute', () => {
    const wool: PeriodicLayer = { kind: 'material', thickness: 0.02, conductivity: 0.035, density: 30, specificHeat: 1030 };
    const r = periodicResponse({ layers: [wool], insideSurfaceResistance: RSI, outsideSurfaceResistance: RSE });
    expect(r.decrementFactor).toBeGreaterThan(0.9999);
    expect(r.decrementFactor).toBeLessThanOrEqual(1);
    expect(r.periodicTransmittance.timeShift).toBeLessThan(0);
    expect(Math.abs(r.periodicTransmittance.timeShift)).toBeLessThan(0.05 * 3600);
  });

  it('det Z = 1 for every layer and for the element (Z is the exponential of a trace-free matrix)', () => {
    for (const thickness of [0.001, 0.05, 0.2, 0.6, 1.5]) {
      const z = layerMatrix({ thickness, conductivity: 2, density: 2400, specificHeat: 1000 }, DAY);
      expectComplex(determinant(z), complex(1), 1e-9 * Math.cosh(thickness / 0.15) ** 2);
    }
    const r = periodicResponse({ layers: [concrete, eps, { kind: 'resistance', resistance: 0.18 }], insideSurfaceResistance: RSI, outsideSurfaceResistance: RSE });
    expectComplex(determinant(r.matrix), complex(1), 1e-10);
  });

  it('a thin layer tends to a pure resistance: Z₁₂ → −d/λ, Z₁₁ → 1', () => {
    const z = layerMatrix({ thickness: 1e-5, conductivity: 2, density: 2400, specificHeat: 1000 }, DAY);
    // ξ = 6.6e-5: Z₁₁ = 1 + iξ² + O(ξ⁴) and Z₁₂ = −(d/λ)(1 + (1 + i)²ξ²/6 + …).
    expectComplex(z.z12, complex(-1e-5 / 2), 1e-8);
    expectComplex(z.z11, complex(1), 1e-8);
  });

  it('reciprocity: reversed layers and films give the same Y_ie and swap the two sides', () => {
    const forward = periodicResponse({ layers: [concrete, eps], insideSurfaceResistance: RSI, outsideSurfaceResistance: RSE });
    const reversed = periodicResponse({ layers: [eps, concrete], insideSurfaceResistance: RSE, outsideSurfaceResistance: RSI });
    expect(reversed.periodicTransmittance.amplitude).toBeCloseTo(forward.periodicTransmittance.amplitude, 12);
    expect(reversed.periodicTransmittance.timeShift).toBeCloseTo(forward.periodicTransmittance.timeShift, 6);
    expect(reversed.insideAdmittance.amplitude).toBeCloseTo(forward.outsideAdmittance.amplitude, 10);
    expect(reversed.insideArealHeatCapacity).toBeCloseTo(forward.outsideArealHeatCapacity, 4);
    expect(reversed.outsideArealHeatCapacity).toBeCloseTo(forward.insideArealHeatCapacity, 4);
  });

  it('the time shift grows steadily with the thickness of concrete, through 12 h and beyond, with no jump', () => {
    let previous: number | null = null;
    for (let d = 0.05; d <= 1.2 + 1e-9; d += 0.01) {
      const r = periodicResponse({ layers: [{ ...concrete, thickness: d }, eps], insideSurfaceResistance: RSI, outsideSurfaceResistance: RSE });
      const lag = -r.periodicTransmittance.timeShift / 3600;
      if (previous !== null) {
        expect(lag).toBeGreaterThan(previous);
        expect(lag - previous).toBeLessThan(0.5);
      }
      previous = lag;
    }
    expect(previous!).toBeGreaterThan(24);
  });
});

describe('bad input: one sentence naming the field', () => {
  const base: PeriodicElement = { layers: [concrete], insideSurfaceResistance: RSI, outsideSurfaceResistance: RSE };
  it.each([
    ['layers[0].density', 'layers[0].density must be greater than 0 kg/m³ (got 0).', { ...base, layers: [{ ...concrete, density: 0 }] }],
    ['layers[0].specificHeat', 'layers[0].specificHeat must be a finite number in J/(kg·K) (got NaN).', { ...base, layers: [{ ...concrete, specificHeat: Number.NaN }] }],
    ['layers[1].resistance', null, { ...base, layers: [concrete, { kind: 'resistance', resistance: -0.1 }] }],
    ['outsideSurfaceResistance', null, { ...base, outsideSurfaceResistance: -1 }],
    ['layers', 'layers must hold at least one layer.', { ...base, layers: [] }],
    // 100 m of concrete is 660 penetration depths for a day.
    ['layers', null, { ...base, layers: [{ ...concrete, thickness: 100 }] }],
  ] as const)('names %s', (field, message, element) => {
    const error = thrownBy(() => periodicResponse(element as PeriodicElement));
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).field).toBe(field);
    if (message !== null) expect((error as InputError).message).toBe(message);
    else expect((error as InputError).message).toMatch(/^[^\n]+\.$/);
  });

  it('a period that is not positive', () => {
    const error = thrownBy(() => periodicResponse(base, 0));
    expect((error as InputError).field).toBe('period');
  });
});
