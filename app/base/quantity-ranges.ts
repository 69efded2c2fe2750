/**
 * The documented finite range of every kind of number a case file holds, in SI (temperatures °C).
 * Each is wide enough for every real installation and narrow enough that the engine never meets an
 * overflow, an allocation of absurd size or a system too ill-conditioned to solve: a value outside
 * it is a unit slip or a typing error, refused at the edge before any work starts. The JSON
 * Schemas in data/schemas state the same bounds (tests/cases checks that they agree).
 * Values are common practice, no source, unless a comment says otherwise.
 */
import type { NumberRange } from './number-range.js';

// Each range names its quantity kind (app/base/quantities), so a refusal states it in a project's
// units; the opening area of an air layer is per m or per m² by the layer's direction, so its kind
// is given where the direction is known (app/cases/wall).

export const QUANTITY_RANGES = {
  /** Any temperature of a raw conduction case; above 3000 °C a plausibility warning is given. */
  conductionTemperature: { min: -273.15, minExclusive: true, max: 1e7, unit: '°C', quantity: 'temperature' },
  /** A layer of a conduction case: a micrometre coating to a 100 m soil column. */
  conductionThickness: { min: 1e-6, max: 100, unit: 'm', quantity: 'thickness' },
  /** Inner radius of an axisymmetric conduction case; below 0.1 mm or above 10 m a warning is given. */
  innerRadius: { min: 1e-6, max: 1000, unit: 'm', quantity: 'position' },
  /** Thermal conductivity: below aerogels and vacuum panels' cores to above copper and silver. */
  conductivity: { min: 0.001, max: 1000, unit: 'W/(m·K)', quantity: 'conductivity' },
  /** Coefficient of a polynomial λ(θ) term, W/(m·K) per °C to the power of the term. */
  polynomialCoefficient: { min: -1000, max: 1000, unit: '' },
  /** Film coefficient of a face (0 = adiabatic); condensing steam is of the order of 1e4. */
  filmCoefficient: { min: 0, max: 1e6, unit: 'W/(m²·K)', quantity: 'filmCoefficient' },
  /** Heat flux on a face, either sign: a megawatt per m² is beyond any boiler tube. */
  heatFlux: { min: -1e7, max: 1e7, unit: 'W/m²', quantity: 'heatFlux' },
  /** Volumetric heat generation, either sign. */
  heatGeneration: { min: -1e9, max: 1e9, unit: 'W/m³', quantity: 'heatGeneration' },
  density: { min: 0, minExclusive: true, max: 25000, unit: 'kg/m³', quantity: 'density' },
  specificHeat: { min: 0, minExclusive: true, max: 20000, unit: 'J/(kg·K)', quantity: 'specificHeat' },
  contactResistance: { min: 0, max: 10, unit: 'm²·K/W', quantity: 'thermalResistance' },
  /** Time step and duration of a transient case: a millisecond to about 30 years. */
  timeStep: { min: 1e-3, max: 1e9, unit: 's', quantity: 'time' },
  duration: { min: 1e-3, max: 1e9, unit: 's', quantity: 'time' },
  /** Picard/Newton tolerance on the temperature change. */
  temperatureTolerance: { min: 1e-14, max: 1, unit: 'K', quantity: 'temperatureDifference' },
  /** Surface area of a flat surface or wall. */
  area: { min: 0, minExclusive: true, max: 1e6, unit: 'm²', quantity: 'area' },
  /** Thickness of a wall or roof layer. */
  wallLayerThickness: { min: 1e-6, max: 5, unit: 'm', quantity: 'thickness' },
  /** Opening area of a ventilated air layer, per m length (vertical) or per m² (horizontal). */
  openingArea: { min: 0, max: 1e6, unit: 'mm² per m or per m²' },
  /** A surface resistance given directly (ISO 6946 tabulates 0.04 to 0.17). */
  surfaceResistance: { min: 0, minExclusive: true, max: 10, unit: 'm²·K/W', quantity: 'thermalResistance' },
  /**
   * An unventilated or ventilated air layer of a wall: from 1 mm, below which the boards touch and
   * the gap is a contact, not an air layer (common practice, no source), to 0.3 m, the largest
   * ISO 6946's air-layer rules cover (app/physics AIR_LAYER_MAXIMUM_THICKNESS).
   */
  airLayerThickness: { min: 0.001, max: 0.3, unit: 'm', quantity: 'thickness' },
  /** An insulation layer, or the plate of a flat surface: a micrometre, as a wall layer, to 2 m. */
  insulationThickness: { min: 1e-6, max: 2, unit: 'm', quantity: 'thickness' },
  /** A jacket over insulation: a micrometre foil to a 20 mm sheet. */
  jacketThickness: { min: 1e-6, max: 0.02, unit: 'm', quantity: 'thickness' },
  /**
   * A pipe wall: a micrometre, as a wall layer, up to (not including) half the largest outer
   * diameter; the case checks it against half its own pipe's diameter as well.
   */
  pipeWallThickness: { min: 1e-6, max: 2.5, maxExclusive: true, unit: 'm', quantity: 'thickness' },
  /**
   * The height the air rises along a vertical flat surface, or the characteristic length (area over
   * perimeter) of a horizontal one: from 1 cm, below which the surface is a boss or a fitting that
   * no plate correlation describes and the film coefficient grows without bound as the length
   * shrinks (common practice, no source), to 1 km.
   */
  surfaceLength: { min: 0.01, max: 1000, unit: 'm', quantity: 'length' },
  /** The height the air rises along a vertical pipe: from 1 cm (as surfaceLength) to the longest run. */
  pipeHeight: { min: 0.01, max: 1e6, unit: 'm', quantity: 'length' },
} as const satisfies Record<string, NumberRange>;

/** Elements a case may ask for in one layer; the engine's own limit is higher, for benchmarks. */
export const MAX_CASE_ELEMENTS_PER_LAYER = 10_000;
/**
 * Elements a whole case may have, over all its layers (those it asks for and the engine's defaults
 * for the rest): five layers at the per-layer limit. A hundred layers of 10,000 elements each
 * solve for tens of seconds and print hundreds of megabytes of nodal results, far beyond any mesh
 * a convergence study needs (common practice, no source).
 */
export const MAX_CASE_ELEMENTS = 50_000;
