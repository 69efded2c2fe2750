/**
 * The outer-surface film as the solver calls it: with every intermediate iterate of the surface
 * temperature, however far from where the surface can be. It must answer any finite iterate with a
 * finite film (never a refusal naming an internal quantity), evaluate a surface inside its window
 * exactly as it stands, stay constant beyond the window's ends, and say so in a warning when a
 * converged surface puts the film temperature beyond the air properties' −100 to 400 °C.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { AIR_EXTRAPOLATION_LIMITS, InputError, outerSurfaceExchange, type OuterSurfaceSpec } from '../../app/physics/index.js';
import { thrownBy } from './thrown-error.js';
import { writeSentence } from '../../app/base/quantity-sentence.js';
import { quantityText } from '../../app/base/quantity-text.js';

const steamMain: OuterSurfaceSpec = {
  shape: { kind: 'pipe', orientation: 'horizontal', outerDiameter: 0.3 },
  exposure: { kind: 'outdoor', windSpeed: 5 },
  method: { kind: 'correlations' },
  airTemperature: 5,
  surroundingsTemperature: -5,
  emissivity: 0.26,
};
const bounded: OuterSurfaceSpec = { ...steamMain, boundingTemperatures: { lowest: -5, highest: 180 } };

describe('the outer-surface film takes any iterate of the solve', () => {
  for (const method of [{ kind: 'correlations' }, { kind: 'simplified' }, { kind: 'fixed-convection', coefficient: 4 }, { kind: 'fixed-coefficient', coefficient: 10 }] as const) {
    it(`${method.kind}: any finite surface temperature gives a finite film, bounded or not`, () => {
      for (const spec of [{ ...steamMain, method }, { ...bounded, method }]) {
        const film = outerSurfaceExchange(spec);
        fc.assert(
          fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (surface) => {
            const exchange = film(surface);
            expect(Number.isFinite(exchange.coefficient) && exchange.coefficient >= 0).toBe(true);
            expect(Number.isFinite(exchange.ambient)).toBe(true);
          }),
        );
      }
    });
  }

  it('inside the bounding temperatures the film is evaluated where the surface is', () => {
    for (const surface of [-5, 0, 20, 60, 179.9, 180]) expect(outerSurfaceExchange(bounded)(surface)).toEqual(outerSurfaceExchange(steamMain)(surface));
  });

  it('beyond them it is the film at the nearer end', () => {
    const film = outerSurfaceExchange(bounded);
    expect(film(2500)).toEqual(film(180));
    expect(film(-900)).toEqual(film(-5));
  });

  it('a converged surface beyond the air properties is evaluated at their limit and warned about', () => {
    const hotDuct: OuterSurfaceSpec = { ...steamMain, airTemperature: 20, surroundingsTemperature: 20, boundingTemperatures: { lowest: 20, highest: 1000 } };
    const film = outerSurfaceExchange(hotDuct);
    // Film temperature (θ_s + θ_a)/2 at the upper limit: θ_s = 2·400 − 20 = 780 °C.
    const limit = 2 * AIR_EXTRAPOLATION_LIMITS.maximum - 20;
    const beyond = film(900);
    expect(beyond.coefficient).toBe(film(limit).coefficient);
    expect(beyond.warnings.map((w) => writeSentence(w))).toContain(
      'The film temperature 460.0 °C is beyond the -100 to 400 °C the air properties are known for; convection was evaluated as at a surface of 780.0 °C.',
    );
    // The same warning for a US project: θ_F = 1.8·θ_C + 32 (NIST SP 811, Appendix B), so 460 °C
    // = 860 °F, −100 °C = −148 °F, 400 °C = 752 °F and 780 °C = 1436 °F.
    expect(beyond.warnings.map((w) => writeSentence(w, quantityText('IP')))).toContain(
      'The film temperature 860.0 °F is beyond the −148 to 752 °F the air properties are known for; convection was evaluated as at a surface of 1436.0 °F.',
    );
    expect(film(500).warnings.some((w) => writeSentence(w).startsWith('The film temperature'))).toBe(false);
  });

  it('a temperature that is not a number, or bounds the wrong way round, are still refused naming the field', () => {
    const notANumber = thrownBy(() => outerSurfaceExchange(bounded)(Number.NaN));
    expect(notANumber).toBeInstanceOf(InputError);
    expect((notANumber as InputError).field).toBe('surfaceTemperature');
    const reversed = thrownBy(() => outerSurfaceExchange({ ...steamMain, boundingTemperatures: { lowest: 180, highest: -5 } }));
    expect((reversed as InputError).field).toBe('boundingTemperatures.highest');
  });
});
