/**
 * A run of the schedule as the pipe case it stands for: the run's size, length and fluid
 * temperature; the air of its condition set (the row's own values where given); the service's
 * criteria as the case's sizing block over the insulation material's own thickness series. The
 * pipeline (solveCase) then sizes it exactly as it sizes a case typed into the editor, so a run of
 * the schedule and the same case by hand give the same thickness.
 *
 * The fluid temperature is put on the pipe's inner face: the inside film is left out, which errs
 * towards more heat loss and a hotter (or colder) surface (common practice, no source).
 */
import { InputError } from '../base/input-error.js';
import type { ConditionSet, ScheduleRun, ScheduleSettings, ServiceRule } from './schedule-model.js';

/** The library material of the pipe wall for each size series (seed materials, data/materials). */
export const PIPE_MATERIAL_OF_SERIES: Readonly<Record<ScheduleRun['pipeSeries'], string>> = {
  'steel-iso': 'Carbon steel pipe',
  'steel-asme': 'Carbon steel pipe',
  'copper-en1057': 'Copper pipe',
  'copper-astm-b88': 'Copper pipe',
  'plastic-metric': 'Polyethylene pipe, high density (PE-HD)',
};

/** The library's id of a material by its name, or undefined. */
export type MaterialIdOf = (name: string) => number | undefined;

/** Where a problem with a run lies: the schedule column and one sentence. */
export class RunProblem extends Error {
  override readonly name = 'RunProblem';
  constructor(readonly column: string, message: string) {
    super(message);
  }
}

export function serviceRuleOf(run: ScheduleRun, settings: ScheduleSettings): ServiceRule {
  const rule = settings.services.find((s) => s.service.toLowerCase() === run.service.toLowerCase());
  if (!rule) {
    const known = settings.services.map((s) => `'${s.service}'`).join(', ');
    throw new RunProblem('service', `service '${run.service}' is not a service of the project (${known === '' ? 'it has none' : known}); add it to the project's services or use one of them.`);
  }
  return rule;
}

/** The air around the run: its condition set, with the row's own values over it. */
export function airOf(run: ScheduleRun, settings: ScheduleSettings): ConditionSet {
  const plain = run.location === 'indoor' || run.location === 'outdoor';
  const set = plain ? undefined : settings.conditionSets.find((c) => c.name.toLowerCase() === run.location.toLowerCase());
  if (!plain && !set) {
    const known = settings.conditionSets.map((c) => `'${c.name}'`).join(', ');
    throw new RunProblem('location', `location '${run.location}' is neither indoor, outdoor nor a condition set of the project (${known === '' ? 'it has none' : known}).`);
  }
  const exposure = set?.exposure ?? (run.location as 'indoor' | 'outdoor');
  const airTemperature = run.airTemperature ?? set?.airTemperature;
  const relativeHumidity = run.relativeHumidity ?? set?.relativeHumidity;
  const windSpeed = exposure === 'indoor' ? 0 : (run.windSpeed ?? set?.windSpeed);
  if (airTemperature === undefined) throw new RunProblem('air temperature', `air temperature is needed for a run ${run.location} that names no condition set.`);
  if (relativeHumidity === undefined) throw new RunProblem('relative humidity', `relative humidity is needed for a run ${run.location} that names no condition set.`);
  if (windSpeed === undefined) throw new RunProblem('wind speed', 'wind speed is needed for a run outdoor that names no condition set.');
  return { name: set?.name ?? run.location, airTemperature, relativeHumidity, exposure, windSpeed };
}

function idOf(name: string, column: string, materialIdOf: MaterialIdOf): number {
  const id = materialIdOf(name);
  if (id === undefined) throw new RunProblem(column, `${column} '${name}' is not a material of the library; add it to the library or name one that is there.`);
  return id;
}

/**
 * The pipe case of `run`: sized over its material's series, or (with a fixed thickness) solved at
 * it, with the service's criteria either way so the row can say whether they are met.
 * `thickness` is the layer's own in the case (the chosen one, for the solve at it); `withoutSizing`
 * leaves the sizing block out.
 */
export function runCase(
  run: ScheduleRun,
  settings: ScheduleSettings,
  materialIdOf: MaterialIdOf,
  options: { readonly thickness?: number; readonly withoutSizing?: boolean } = {},
): Record<string, unknown> {
  const rule = serviceRuleOf(run, settings);
  const air = airOf(run, settings);
  const material = run.material ?? rule.material;
  const insulationId = idOf(material, run.material === null ? 'service material' : 'insulation material', materialIdOf);
  const pipeId = idOf(PIPE_MATERIAL_OF_SERIES[run.pipeSeries], 'pipe series', materialIdOf);
  // A run to be sized is tried over its material's series; a fixed one at its own thickness only.
  const thickness = options.thickness ?? run.thickness ?? 0.02;
  const sizing = {
    layer: 0,
    series: run.thickness === null ? { kind: 'material' } : { kind: 'list', thicknesses: [run.thickness] },
    criteria: rule.criteria,
  };
  return {
    schemaVersion: 1,
    kind: 'pipe',
    title: `${run.reference}: ${run.service}`,
    pipe: { size: { series: run.pipeSeries, nominal: run.pipeSize }, materialId: pipeId, ...(run.wallThickness === null ? {} : { wallThickness: run.wallThickness }) },
    inner: { kind: 'surface', temperature: run.fluidTemperature },
    layers: [{ materialId: insulationId, thickness }],
    orientation: run.orientation,
    // A vertical run rises over its length (the height of the natural-convection correlation).
    ...(run.orientation === 'vertical' ? { height: run.length } : {}),
    ambient: {
      airTemperature: air.airTemperature,
      relativeHumidity: air.relativeHumidity,
      exposure: air.exposure === 'indoor' ? { kind: 'indoor' } : { kind: 'outdoor', windSpeed: air.windSpeed },
    },
    length: run.length,
    operatingHours: settings.operatingHours,
    ...(options.withoutSizing ? {} : { sizing }),
  };
}

/**
 * The same run with no insulation: the pipe's own surface, modelled as a layer of the pipe's own
 * material 1 µm thick (the engine needs one layer; it adds nothing measurable to the resistance or
 * the diameter and gives the outer surface the pipe's emissivity).
 */
export function bareRunCase(run: ScheduleRun, settings: ScheduleSettings, materialIdOf: MaterialIdOf): Record<string, unknown> {
  const insulated = runCase(run, settings, materialIdOf, { withoutSizing: true });
  const pipe = insulated['pipe'] as { materialId: number };
  return { ...insulated, title: `${run.reference}: ${run.service}, bare`, layers: [{ materialId: pipe.materialId, thickness: 1e-6 }] };
}

/** A case field's refusal as a problem of the schedule's column it came from. */
export function columnOfCaseField(field: string): string {
  if (field.startsWith('pipe.size') || field === 'pipe.outerDiameter') return 'pipe size';
  if (field.startsWith('pipe.wallThickness')) return 'wall thickness';
  if (field.startsWith('inner')) return 'fluid temperature';
  if (field === 'length' || field === 'height') return 'length';
  if (field.startsWith('ambient.airTemperature')) return 'air temperature';
  if (field.startsWith('ambient.relativeHumidity')) return 'relative humidity';
  if (field.startsWith('ambient.exposure')) return 'wind speed';
  if (field.startsWith('layers')) return 'insulation thickness';
  if (field.startsWith('sizing')) return 'service';
  return 'reference';
}

export function asRunProblem(error: unknown): RunProblem | null {
  if (error instanceof RunProblem) return error;
  if (error instanceof InputError) return new RunProblem(columnOfCaseField(error.field), error.message);
  return null;
}
