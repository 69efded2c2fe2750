/** Physical constants used by the surface physics and psychrometrics (SI). */

/** Stefan–Boltzmann constant, W/(m²·K⁴) (CODATA 2018, exact by definition of the SI units). */
export const STEFAN_BOLTZMANN = 5.670374419e-8;

/** Offset between the Celsius and kelvin scales, K. */
export const KELVIN_OFFSET = 273.15;

/** Standard gravity used in the Rayleigh number, m/s² (rounded as in the textbook examples). */
export const GRAVITY = 9.81;

/** Specific gas constant of water vapour, J/(kg·K). */
export const WATER_VAPOUR_GAS_CONSTANT = 461.5;

/** θ in °C → T in K. */
export function toKelvin(celsius: number): number {
  return celsius + KELVIN_OFFSET;
}
