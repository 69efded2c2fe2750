/**
 * The two money factors the economic thickness rests on, shown beside the sizing table.
 *
 * Convention (chosen here and used everywhere in sizing): the energy price given is today's
 * (year 0) price; the energy of year k (k = 1..n) is paid at the end of year k, at the price
 * escalated k times, (1 + e)^k, and is discounted by (1 + i)^k. So the present value of n years of
 * energy whose first-year cost at today's price is C is C·PV with
 *
 *   PV = Σ_{k=1..n} x^k,  x = (1 + e)/(1 + i)  =  x·(1 − xⁿ)/(1 − x)  =  (1 − xⁿ)·(1 + e)/(i − e),
 *
 * and PV = n when e = i (every year's escalation cancels its discounting). The present-worth method
 * states the factor this way (VDI 2055-1, from memory); paying the first year at today's price
 * instead would divide it by (1 + e).
 *
 * The annuity (capital recovery) factor a = i/(1 − (1 + i)^−n), 1/n when i = 0, turns a present
 * sum into n equal year-end payments.
 */

/**
 * x^n − 1 from x − 1, without the cancellation of `x ** n - 1` when x is near 1: through log1p
 * and expm1, so PV stays smooth (and exact in the limit) as e → i. x − 1 is written from the
 * rates, (e − i)/(1 + i), so it keeps its digits where ln(1 + e) − ln(1 + i) would lose them.
 */
function growthMinusOne(xMinusOne: number, years: number): number {
  return Math.expm1(years * Math.log1p(xMinusOne));
}

/**
 * Present value of n year-end amounts that grow at `escalation` and are discounted at
 * `discountRate`, per unit of the first year's amount at today's price (see the convention above).
 * Rates are fractions per year (0.03 = 3 %/a), both greater than −1; years ≥ 0.
 */
export function presentValueFactor(escalation: number, discountRate: number, years: number): number {
  if (escalation === discountRate) return years;
  const xMinusOne = (escalation - discountRate) / (1 + discountRate);
  return ((1 + xMinusOne) * growthMinusOne(xMinusOne, years)) / xMinusOne;
}

/** Capital recovery factor a = i/(1 − (1 + i)^−n); 1/n at i = 0 (the limit). Years > 0. */
export function annuityFactor(discountRate: number, years: number): number {
  if (discountRate === 0) return 1 / years;
  // 1 − (1 + i)^−n = −expm1(−n·ln(1 + i)), accurate for a small rate.
  return discountRate / -Math.expm1(-years * Math.log1p(discountRate));
}

/** The factors SizingResult.factors shows, from the economics' rates and years. */
export function economicFactors(economics: { readonly priceEscalation: number; readonly discountRate: number; readonly years: number }): {
  readonly presentValue: number;
  readonly annuity: number;
} {
  return {
    presentValue: presentValueFactor(economics.priceEscalation, economics.discountRate, economics.years),
    annuity: annuityFactor(economics.discountRate, economics.years),
  };
}
