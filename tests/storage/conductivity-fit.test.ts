import { describe, expect, it } from 'vitest';
import { conductivityAt } from '../../app/fe/conductivity.js';
import { fitConductivityCurve } from '../../main/services/conductivity-fit.js';
import { polynomialMinimumOn } from '../../main/services/polynomial-minimum.js';

describe('conductivity curve fit (least squares, ml-matrix)', () => {
  it('recovers an exact quadratic from its own points', () => {
    // Illustrative rock-wool curve λ = 0.0337 + 1.1e-4·θ + 1.7e-7·θ² (reference notes §5.2, common practice, no source).
    const exact = [0.0337, 1.1e-4, 1.7e-7];
    const points = [10, 50, 100, 200, 300].map((t) => [t, exact[0]! + exact[1]! * t + exact[2]! * t * t]);
    const fit = fitConductivityCurve(points, { degree: 2, minServiceTemperature: 0, maxServiceTemperature: 300 });
    fit.model.coefficients.forEach((c, i) => expect(c).toBeCloseTo(exact[i]!, 12));
    expect(fit.rmsResidual).toBeLessThan(1e-15);
    // The stated values 0.0348/0.0396/0.0464/0.0625/0.0820 at 10/50/100/200/300 °C (reference §5.2, derived there from the formula).
    [[10, 0.0348], [50, 0.0396], [100, 0.0464], [200, 0.0625], [300, 0.082]].forEach(([t, k]) => expect(conductivityAt(fit.model, t!)).toBeCloseTo(k!, 4));
  });

  it('matches the textbook closed form for a straight-line least-squares fit and reports the residual', () => {
    // Ordinary least squares for y = a + b·x (any statistics textbook): b = Sxy/Sxx, a = ȳ − b·x̄.
    const points: [number, number][] = [[10, 0.036], [50, 0.039], [100, 0.047], [150, 0.052], [200, 0.061]];
    const n = points.length;
    const mx = points.reduce((s, p) => s + p[0], 0) / n;
    const my = points.reduce((s, p) => s + p[1], 0) / n;
    const b = points.reduce((s, p) => s + (p[0] - mx) * (p[1] - my), 0) / points.reduce((s, p) => s + (p[0] - mx) ** 2, 0);
    const a = my - b * mx;
    const fit = fitConductivityCurve(points, { degree: 1, minServiceTemperature: -20, maxServiceTemperature: 250 });
    expect(fit.model.coefficients[0]).toBeCloseTo(a, 12);
    expect(fit.model.coefficients[1]).toBeCloseTo(b, 14);
    const residuals = points.map(([x, y]) => a + b * x - y);
    expect(fit.rmsResidual).toBeCloseTo(Math.sqrt(residuals.reduce((s, r) => s + r * r, 0) / n), 14);
    expect(fit.maxResidual).toBeCloseTo(Math.max(...residuals.map(Math.abs)), 14);
    expect(fit.rmsResidual).toBeGreaterThan(0);
  });

  it('refuses a curve that goes non-positive inside the service range', () => {
    const falling: [number, number][] = [[0, 0.05], [50, 0.03], [100, 0.012]];
    expect(() => fitConductivityCurve(falling, { degree: 1, minServiceTemperature: 0, maxServiceTemperature: 200 })).toThrow(/conductivity must stay above 0 W\/\(m·K\) from 0 to 200 °C/);
    // The same data is acceptable over a range where the line stays positive.
    expect(fitConductivityCurve(falling, { degree: 1, minServiceTemperature: 0, maxServiceTemperature: 100 }).model.coefficients).toHaveLength(2);
  });

  it('rejects too few points and bad input with one sentence', () => {
    expect(() => fitConductivityCurve([[10, 0.03], [10, 0.031]], { degree: 1, minServiceTemperature: 0, maxServiceTemperature: 100 })).toThrow('points must include at least 2 different temperatures for a degree-1 fit (got 1).');
    expect(() => fitConductivityCurve([[10, -0.03], [20, 0.031]], { degree: 1, minServiceTemperature: 0, maxServiceTemperature: 100 })).toThrow('points[0] conductivity must be more than 0 and at most 1000 W/(m·K) (got -0.03).');
    expect(() => fitConductivityCurve('x', { degree: 1, minServiceTemperature: 0, maxServiceTemperature: 100 })).toThrow('points must be a list of at most 100 [°C, W/(m·K)] pairs.');
    expect(() => fitConductivityCurve([[1, 1], [2, 1], [3, 1]], { degree: 1.5, minServiceTemperature: 0, maxServiceTemperature: 100 })).toThrow('degree must be 1, 2 or 3.');
  });

  it('finds the interior minimum of a polynomial (checked against dense sampling)', () => {
    const c = [0.02, -4e-4, 2e-6, 1e-9]; // dips inside [0, 300]
    const found = polynomialMinimumOn(c, 0, 300);
    let sampled = Infinity;
    for (let i = 0; i <= 300000; i++) sampled = Math.min(sampled, c.reduceRight((acc, k) => acc * (i / 1000) + k, 0));
    expect(found.value).toBeCloseTo(sampled, 10);
    expect(found.x).toBeGreaterThan(0);
    expect(found.x).toBeLessThan(300);
  });
});
