/**
 * A case solved for a US project speaks US customary units in what it refuses and in what it warns
 * of, while the case itself stays SI: a bad value's refusal states the allowed range and the value
 * given in °F, in, ft or in²/ft; the surface physics' warning of a film temperature beyond the air
 * properties reads in °F. With the SI default both read exactly as before.
 *
 * Expected figures are worked by hand with the exact definitions NIST SP 811 (2008), Appendix B
 * lists: θ_F = 1.8·θ_C + 32, 1 in = 0.0254 m, 1 ft = 0.3048 m, 1 in² = 6.4516e-4 m².
 */
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { InputError, parseCase, solveCase } from '../../app/index.js';
import { fromDisplay, toDisplay } from '../../app/base/unit-systems.js';
import { caseContext } from '../../main/cases/case-context.js';

const root = path.resolve(__dirname, '..', '..');
type Json = Record<string, any>;
const example = (file: string): Json => JSON.parse(readFileSync(path.join(root, 'data', 'examples', file), 'utf8'));
const US = { ...caseContext(null), unitSystem: 'IP' as const };
const SI = caseContext(null);

/** The refusal solveCase throws, checked to be the one bad-input error. */
function refusal(json: unknown, context: Parameters<typeof solveCase>[1]): InputError {
  try {
    solveCase(json, context);
  } catch (error) {
    expect(error).toBeInstanceOf(InputError);
    return error as InputError;
  }
  throw new Error('the case was solved, not refused');
}

describe('a refusal reads in the project units', () => {
  it('an insulation layer too thick: the range and the value in inches, the field as before', () => {
    const pipe = example('pipe-hot-water-plant-room.json');
    pipe['layers'][0].thickness = 5;
    const si = refusal(pipe, SI);
    // The SI sentence is the one the command line has always printed.
    expect(si.message).toBe('layers[0].thickness must be at least 0.000001 and at most 2 m (got 5).');
    const us = refusal(pipe, US);
    expect(us.field).toBe(si.field);
    // 1e-6 m = 3.93701e-5 in, 2 m = 78.7402 in, 5 m = 196.850 in (1 in = 0.0254 m).
    expect(us.message).toBe('layers[0].thickness must be at least 0.0000393701 and at most 78.7402 in (got 196.85 in).');
    // The same refusal from parseCase, which the projects service calls before saving.
    expect(() => parseCase(pipe, US)).toThrow(us.message);
  });

  it('a value typed in inches is refused as typed', () => {
    const pipe = example('pipe-hot-water-plant-room.json');
    // The form stores 100 in as SI metres; the refusal gives back the number the user typed.
    pipe['layers'][0].thickness = fromDisplay(100, 'thickness', 'IP');
    expect(refusal(pipe, US).message).toMatch(/\(got 100 in\)\.$/);
  });

  it('a pipe wall thicker than the pipe allows: the bound from its diameter in inches', () => {
    const pipe = example('pipe-hot-water-plant-room.json');
    pipe['pipe'].wallThickness = 0.06;
    expect(refusal(pipe, SI).message).toBe('pipe.wallThickness must be at least 0.000001 m and less than half of pipe.outerDiameter (0.05715 m) (got 0.06).');
    // Half of 0.1143 m is 0.05715 m = 2.25 in; 0.06 m = 2.3622 in (1 in = 0.0254 m).
    expect(refusal(pipe, US).message).toBe('pipe.wallThickness must be at least 0.0000393701 in and less than half of pipe.outerDiameter (2.25 in) (got 2.3622 in).');
  });

  it('a fluid temperature too high: the limits and the value in °F', () => {
    const pipe = example('pipe-hot-water-plant-room.json');
    pipe['inner'].temperature = 1200;
    expect(refusal(pipe, SI).message).toBe('inner.temperature must be between -270 °C and 1000 °C (got 1200).');
    // −270 °C = −454 °F, 1000 °C = 1832 °F, 1200 °C = 2192 °F.
    expect(refusal(pipe, US).message).toBe('inner.temperature must be between −454 °F and 1832 °F (got 2192 °F).');
  });

  it('a pipe run of negative length: feet', () => {
    const pipe = example('pipe-hot-water-plant-room.json');
    pipe['length'] = -3;
    expect(refusal(pipe, SI).message).toBe('length must be greater than 0 m and at most 1000000 m (got -3).');
    // 1e6 m = 3.28084e6 ft and −3 m = −9.84252 ft (1 ft = 0.3048 m); large bounds are written as
    // the field hints write them.
    expect(refusal(pipe, US).message).toBe('length must be greater than 0 ft and at most 3.28084e6 ft (got −9.84252 ft).');
  });

  it("a wall's outside air too hot: °F", () => {
    const wall = example('wall-timber-frame-vcl.json');
    wall['outside'].temperature = 150;
    expect(refusal(wall, SI).message).toBe('outside.temperature must be between -100 °C and 100 °C (got 150).');
    // −100 °C = −148 °F, 100 °C = 212 °F, 150 °C = 302 °F.
    expect(refusal(wall, US).message).toBe('outside.temperature must be between −148 °F and 212 °F (got 302 °F).');
  });

  it('a vent opening that does not match the ventilation: in²/ft on a wall', () => {
    const wall = example('wall-timber-frame-vcl.json');
    const cavity = wall['layers'].findIndex((l: Json) => l.kind === 'air-layer');
    wall['layers'][cavity].openingArea = 1000;
    const field = `layers[${cavity}].ventilation`;
    expect(refusal(wall, SI).message).toBe(
      `${field} is 'well-ventilated' but an opening area of 1000 mm² per m (or per m²) makes the layer 'slightly-ventilated' (≤ 500 unventilated, 500 to 1500 slightly, above 1500 well ventilated).`,
    );
    // 1 in²/ft = 6.4516e-4 m² / 0.3048 m = 2116.667 mm²/m: 1000 mm²/m = 0.472441 in²/ft,
    // 500 = 0.23622 and 1500 = 0.708661 in²/ft.
    expect(refusal(wall, US).message).toBe(
      `${field} is 'well-ventilated' but an opening area of 0.472441 in²/ft makes the layer 'slightly-ventilated' (≤ 0.23622 unventilated, 0.23622 to 0.708661 slightly, above 0.708661 well ventilated).`,
    );
  });

  it('a refusal with no figure to convert reads the same in both systems', () => {
    const pipe = example('pipe-hot-water-plant-room.json');
    pipe['inner'].kind = 'steam';
    expect(refusal(pipe, US).message).toBe(refusal(pipe, SI).message);
  });
});

/** SI units of kinds that have a US unit, as tests/report/us-sentences.test.ts looks for them in sentences. */
const SI_UNITS: readonly RegExp[] = [/°C/, /\d K\b/, / W\/m/, /\d W\b/, /W\/\(m/, /m²·K\/W/, /\d mm\b/, /\d m\b/, /\bm²/, /m\/s/, /\d Pa\b/, /kg\/m/, / in m\b/];

/** The path of every number in a case file ("layers[0].thickness"). */
function numberPaths(value: unknown, at: string, out: string[] = []): string[] {
  if (Array.isArray(value)) value.forEach((v, i) => numberPaths(v, `${at}[${i}]`, out));
  else if (value !== null && typeof value === 'object') for (const [k, v] of Object.entries(value)) numberPaths(v, at ? `${at}.${k}` : k, out);
  else if (typeof value === 'number') out.push(at);
  return out;
}

function withValueAt(json: Json, at: string, value: unknown): Json {
  const copy = structuredClone(json);
  const keys = at.replace(/\[(\d+)\]/g, '.$1').split('.');
  let node: Json = copy;
  for (const key of keys.slice(0, -1)) node = node[key];
  node[keys[keys.length - 1]!] = value;
  return copy;
}

describe('every refusal of a pipe, flat or wall example reads without an SI unit in a US project', () => {
  const files = readdirSync(path.join(root, 'data', 'examples')).filter((f) => /^(pipe|flat|wall)-.*\.json$/.test(f));
  for (const file of files) {
    it(`${file}: each number set far out of range, negative, zero or to text`, () => {
      const json = example(file);
      const unconverted: string[] = [];
      // λ(θ) models are checked by the engine's own validation, which speaks SI (see the report).
      for (const at of numberPaths(json, '').filter((p) => !p.includes('.conductivity'))) {
        for (const bad of [1e12, -1e12, 0, 'x']) {
          try {
            solveCase(withValueAt(json, at, bad), US);
          } catch (error) {
            expect(error).toBeInstanceOf(InputError);
            const message = (error as InputError).message;
            if (SI_UNITS.some((unit) => unit.test(message))) unconverted.push(message);
          }
        }
      }
      expect(unconverted).toEqual([]);
    });
  }
});

describe('a surface-physics warning reads in the project units', () => {
  /** A pipe whose outer surface is near 1000 °C: the film temperature is beyond the 400 °C of the air-property table. */
  function glowingPipe(): Json {
    const pipe = example('pipe-hot-water-plant-room.json');
    pipe['inner'] = { kind: 'surface', temperature: 1000 };
    pipe['pipe'].material.maxServiceTemperature = undefined;
    pipe['layers'] = [{ material: { name: 'Thin conducting coat (test)', category: 'insulation', conductivity: 50, emissivity: 0.9 }, thickness: 0.001 }];
    delete pipe['jacket'];
    delete pipe['touchLimit'];
    return pipe;
  }
  const filmWarning = (warnings: readonly string[]) => warnings.filter((w) => w.startsWith('The film temperature'));

  it('in SI as it always was; in US units in °F, the same temperatures converted', () => {
    const si = solveCase(glowingPipe(), SI);
    const us = solveCase(glowingPipe(), US);
    const surface = (si.result as { surfaceTemperature: number }).surfaceTemperature;
    const air = (si.input as { ambient: { airTemperature: number } }).ambient.airTemperature;
    const film = (surface + air) / 2;
    expect(film).toBeGreaterThan(400);
    // The surface is evaluated at the limit θ_s = 2·400 °C − θ_a (app/physics/outer-surface-exchange).
    const held = 2 * 400 - air;
    expect(filmWarning(si.warnings)).toEqual([
      `The film temperature ${film.toFixed(1)} °C is beyond the -100 to 400 °C the air properties are known for; convection was evaluated as at a surface of ${held.toFixed(1)} °C.`,
    ]);
    // θ_F = 1.8·θ_C + 32: −100 °C = −148 °F, 400 °C = 752 °F.
    const fahrenheit = (c: number) => (1.8 * c + 32).toFixed(1);
    expect(filmWarning(us.warnings)).toEqual([
      `The film temperature ${fahrenheit(film)} °F is beyond the −148 to 752 °F the air properties are known for; convection was evaluated as at a surface of ${fahrenheit(held)} °F.`,
    ]);
    expect(filmWarning(us.report.warnings)).toEqual(filmWarning(us.warnings));
    // The result itself is the same SI result.
    expect(us.result).toMatchObject({ surfaceTemperature: surface });
  });
});

describe("the simplified method's caution reads in the project units", () => {
  it("a steam main in wind: the caution's coefficients, diameter and wind speed converted", () => {
    const steam = { ...example('pipe-steam-outdoor.json'), surfaceMethod: { kind: 'simplified' } };
    const caution = (warnings: readonly string[]) => warnings.filter((w) => w.includes('treat the result with caution'));
    expect(caution(solveCase(steam, SI).warnings)[0]).toContain('(44.5 against 20.8 W/(m²·K) at D = 0.2 m, v = 5 m/s)');
    // 1 Btu/(h·ft²·°F) = 5.678263 W/(m²·K), 1 in = 0.0254 m, 1 mph = 0.44704 m/s (NIST SP 811, Appendix B).
    expect(caution(solveCase(steam, US).warnings)[0]).toContain('(7.84 against 3.66 Btu/(h·ft²·°F) at D = 7.874 in, v = 11 mph)');
  });
});

describe('the vent opening area has its kind', () => {
  it('1000 mm²/m reads 0.472 in²/ft and comes back to 1e-12; per m² of a roof, in²/ft²', () => {
    // 1 in²/ft = 2116.667 mm²/m; 1 in²/ft² = 1e6/144 = 6944.444 mm²/m² (NIST SP 811, Appendix B).
    expect(toDisplay(1000, 'ventOpeningPerLength', 'IP')).toBeCloseTo(1000 / 2116.6667, 6);
    expect(toDisplay(1000, 'ventOpeningPerArea', 'IP')).toBeCloseTo(0.144, 12);
    for (const kind of ['ventOpeningPerLength', 'ventOpeningPerArea'] as const) {
      for (const stored of [0, 500, 1000, 1500, 2500, 1e6]) {
        const back = fromDisplay(toDisplay(stored, kind, 'IP'), kind, 'IP');
        expect(Math.abs(back - stored)).toBeLessThanOrEqual(1e-12 * stored);
      }
      expect(toDisplay(1000, kind, 'SI')).toBe(1000);
    }
  });

  it('the wall report gives the cavity its opening area by that kind', () => {
    const wall = example('wall-timber-frame-vcl.json');
    const figure = solveCase(wall, US)
      .report.sections.flatMap((s) => s.blocks)
      .flatMap((b) => (b.kind === 'figures' ? b.figures : []))
      .find((f) => f.label.startsWith('Vent opening area'));
    // The cavity of a wall (heat flowing horizontally) is a vertical layer: mm² per m of length.
    expect(figure).toEqual({ label: 'Vent opening area of ventilated cladding cavity', value: 2500, quantity: 'ventOpeningPerLength' });
    const roof = { ...wall, heatFlowDirection: 'upward' };
    const roofFigure = solveCase(roof, US)
      .report.sections.flatMap((s) => s.blocks)
      .flatMap((b) => (b.kind === 'figures' ? b.figures : []))
      .find((f) => f.label.startsWith('Vent opening area'));
    expect(roofFigure?.quantity).toBe('ventOpeningPerArea');
  });
});
