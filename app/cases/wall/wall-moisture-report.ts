/**
 * The moisture part of a wall report: mould and inside-surface condensation (temperature factor),
 * interstitial condensation at the design condition (vapour and saturation pressure through the
 * layers) and over a year (the monthly store of condensate), each with its verdict and its margin
 * in words. Read from the analysis only; nothing is solved here.
 */
import humidityClasses from '../../../data/physics/humidity-classes.json' with { type: 'json' };
import type { QuantityText } from '../../base/quantity-text.js';
import type { CheckResult } from '../../checks/check-result.js';
import type { InsideHumiditySource } from '../../checks/mould-humidity-classes.js';
import { conditionPhrase } from '../../checks/mould-check.js';
import { marginPhrase } from '../../report/margin-phrase.js';
import type { ReportSection, ReportTable, ReportVerdict } from '../../report/report-model.js';
import { reportVerdict } from '../../report/report-verdicts.js';
import type { WallAnalysis } from './wall-analysis.js';
import type { WallInput } from './wall-input.js';

const VAPOUR_TABLE = 'Vapour pressure through the layers at the design condition';
const MONTHLY_TABLE = 'Condensate stored at the end of each month';
const MOULD_TABLE = 'Critical temperature factors, condition by condition';

/**
 * The moisture checks name the humidity-class table's provenance inside their sentences; a
 * verdict speaks plainly, so the report moves it to the sources (wall-report.ts lists it there).
 * Their design temperatures are written as given, so a negative one gets the true minus sign here.
 */
function plainReason(check: CheckResult): string {
  return check.reason
    .split(` (${humidityClasses.label})`)
    .join('')
    .replace(/(^|[\s(])-(\d)/g, '$1−$2');
}

/** The inside humidity the checks used, in plain words. */
export function insideHumidityWords(source: InsideHumiditySource | undefined): string {
  if (!source || source.kind === 'measured') return 'the inside relative humidity as given';
  return `internal humidity class ${source.humidityClass}${source.safetyFactor ? ' with the 1.1 safety factor on the vapour pressure excess' : ''}`;
}

export function wallVerdicts(a: WallAnalysis, text: QuantityText): ReportVerdict[] {
  const factorMargin = (check: CheckResult) =>
    check.margin ? marginPhrase(check.margin.value, 'temperatureFactor', 'the required temperature factor', 'above', text) : undefined;
  const design = a.interstitialDesign.check;
  const monthly = a.interstitialMonthly;
  return [
    reportVerdict(a.mould.mould, factorMargin(a.mould.mould), plainReason(a.mould.mould)),
    reportVerdict(a.mould.surfaceCondensation, factorMargin(a.mould.surfaceCondensation), plainReason(a.mould.surfaceCondensation)),
    reportVerdict(design, design.margin ? vapourMargin(design.margin.value, 'at the interface nearest to it', 'at the worst interface', text) : undefined, plainReason(design)),
    ...(monthly
      ? [
          reportVerdict(
            monthly.check,
            monthly.maxAccumulated === 0
              ? monthly.check.margin
                ? vapourMargin(monthly.check.margin.value, 'in the closest month', 'in the worst month', text)
                : undefined
              : monthly.driesOut
                ? `at most ${text.figure(monthly.maxAccumulated, 'massPerArea')} stored; dries out within the year`
                : `${text.figure(monthly.remainingAtEnd, 'massPerArea')} still stored after twelve months`,
            plainReason(monthly.check),
          ),
        ]
      : []),
  ];
}

/** "vapour pressure 120 Pa below saturation …", from the smallest reserve p_sat − p. */
function vapourMargin(reserve: number, safeWhere: string, unsafeWhere: string, text: QuantityText): string {
  return `vapour pressure ${marginPhrase(reserve, 'vapourPressure', `saturation ${reserve >= 0 ? safeWhere : unsafeWhere}`, 'below', text)}`;
}

export function mouldSection(a: WallAnalysis, text: QuantityText): ReportSection {
  const m = a.mould;
  const design = m.designIndexMould === null ? null : m.conditions[m.designIndexMould]!;
  const table: ReportTable = {
    title: MOULD_TABLE,
    columns: [
      { label: 'Condition' },
      { label: 'θ inside', quantity: 'temperature' },
      { label: 'θ outside', quantity: 'temperature' },
      { label: 'Inside vapour pressure', quantity: 'vapourPressure' },
      { label: 'f_Rsi,min mould', quantity: 'temperatureFactor' },
      { label: 'f_Rsi,min condensation', quantity: 'temperatureFactor' },
    ],
    rows: m.conditions.map((c) => [
      c.label,
      { value: c.inside.temperature, quantity: 'temperature' },
      { value: c.outside.temperature, quantity: 'temperature' },
      { value: c.insideVapourPressure, quantity: 'vapourPressure' },
      { value: c.minimumFactorMould, quantity: 'temperatureFactor' },
      { value: c.minimumFactorCondensation, quantity: 'temperatureFactor' },
    ]),
  };
  return {
    id: 'mould',
    heading: 'Mould and condensation on the inside surface',
    blocks: [
      {
        kind: 'figures',
        figures: [
          { label: 'Temperature factor of the element, f_Rsi', value: m.temperatureFactor, quantity: 'temperatureFactor' },
          { label: 'Critical factor for mould, f_Rsi,min', value: design?.minimumFactorMould ?? null, quantity: 'temperatureFactor', ...(design ? { note: `${conditionPhrase(design.label)}, the governing condition` } : {}) },
          { label: 'Inside surface temperature then', value: m.insideSurfaceTemperature, quantity: 'temperature', note: `with R_si = ${text.figure(m.insideSurfaceResistance, 'thermalResistance')}` },
        ],
      },
      { kind: 'table', table },
      {
        kind: 'paragraphs',
        paragraphs: [
          'f_Rsi = (θ_si − θ_e)/(θ_i − θ_e). The critical factor keeps the monthly mean relative humidity at the inside surface at or below 80 % (mould) or 100 % (condensation); the element passes where its own factor exceeds the largest critical factor over the conditions. A dash: the inside is not warmer than the outside, so the factor does not apply.',
        ],
      },
    ],
  };
}

/** Distances of the interstitial points from the inside surface, m (the included layers, inside first). */
function pointPositions(a: WallAnalysis): number[] {
  const positions = [0];
  for (const layer of a.wall.layers.filter((l) => l.included)) positions.push(positions[positions.length - 1]! + layer.thickness);
  return positions;
}

export function interstitialSection(a: WallAnalysis): ReportSection {
  const d = a.interstitialDesign;
  const positions = pointPositions(a);
  const table: ReportTable = {
    title: VAPOUR_TABLE,
    columns: [
      { label: 'Where' },
      { label: 'Depth', quantity: 'position' },
      { label: 's_d from inside', quantity: 'equivalentAirLayerThickness' },
      { label: 'θ', quantity: 'temperature' },
      { label: 'p_sat', quantity: 'vapourPressure' },
      { label: 'p', quantity: 'vapourPressure' },
      { label: 'g_c', quantity: 'condensationRate' },
    ],
    rows: d.points.map((p, k) => [
      p.name.replace(/^interface between /, 'between '),
      { value: positions[k] ?? null, quantity: 'position' },
      { value: p.sdFromInside, quantity: 'equivalentAirLayerThickness' },
      { value: p.temperature, quantity: 'temperature' },
      { value: p.saturationPressure, quantity: 'vapourPressure' },
      { value: p.vapourPressure, quantity: 'vapourPressure' },
      { value: p.condensationRate, quantity: 'condensationRate' },
    ]),
  };
  const bySd = d.points.filter((p) => p.sdFromInside !== null);
  const withPressure = (x: (k: number) => number | null) =>
    d.points.flatMap((p, k) => (p.vapourPressure !== null && x(k) !== null ? [[x(k)!, p.vapourPressure] as const] : []));
  const saturation = (x: (k: number) => number | null) => d.points.flatMap((p, k) => (x(k) !== null ? [[x(k)!, p.saturationPressure] as const] : []));
  const sdAt = (k: number) => d.points[k]!.sdFromInside;
  const positionAt = (k: number) => positions[k] ?? null;
  const chart = (title: string, x: { label: string; quantity: 'equivalentAirLayerThickness' | 'position' }, at: (k: number) => number | null) => ({
    kind: 'chart' as const,
    chart: {
      title,
      x,
      y: { label: 'pressure', quantity: 'vapourPressure' as const },
      series: [
        { name: 'vapour pressure', points: withPressure(at) },
        { name: 'saturation pressure', points: saturation(at), reference: true },
      ],
      markers: d.points.slice(1, -1).flatMap((p, i) => (at(i + 1) !== null ? [{ x: at(i + 1)!, label: p.name }] : [])),
      tabulatedIn: VAPOUR_TABLE,
    },
  });
  return {
    id: 'interstitial',
    heading: 'Interstitial condensation at the design condition',
    blocks: [
      {
        kind: 'figures',
        figures: [
          { label: 'Inside vapour pressure', value: d.insideVapourPressure, quantity: 'vapourPressure' },
          { label: 'Outside vapour pressure', value: d.outsideVapourPressure, quantity: 'vapourPressure' },
          { label: 'Condensation rate, all interfaces', value: d.totalCondensationRate, quantity: 'condensationRate' },
        ],
      },
      { kind: 'table', table },
      {
        kind: 'paragraphs',
        paragraphs: [
          'Depth is measured from the inside surface; s_d is the equivalent air layer thickness summed from the inside (a dash beyond a vapour-tight layer); p_sat is the saturation pressure, p the vapour pressure and g_c the condensation rate.',
        ],
      },
      ...(bySd.length > 1 ? [chart('Vapour pressure and saturation pressure against s_d from the inside', { label: 's_d from the inside', quantity: 'equivalentAirLayerThickness' }, sdAt)] : []),
      chart('Vapour pressure and saturation pressure through the thickness', { label: 'distance from the inside surface', quantity: 'position' }, positionAt),
    ],
  };
}

export function monthlySection(input: WallInput, a: WallAnalysis): ReportSection | null {
  const m = a.interstitialMonthly;
  if (!m) return null;
  const months = m.months;
  const outside = new Map((input.moisture?.climate?.months ?? []).map((c) => [c.month, c.outside.temperature]));
  const table: ReportTable = {
    title: MONTHLY_TABLE,
    columns: [
      { label: 'Month' },
      { label: 'θ outside', quantity: 'temperature' },
      { label: 'Change in the month', quantity: 'massPerArea' },
      { label: 'Stored at the end', quantity: 'massPerArea' },
    ],
    rows: months.map((month) => [
      month.month,
      { value: outside.get(month.month) ?? null, quantity: 'temperature' },
      { value: month.change.reduce((s, w) => s + w, 0), quantity: 'massPerArea' },
      { value: month.totalAccumulated, quantity: 'massPerArea' },
    ]),
  };
  const start = m.startMonthIndex === null ? null : months[0]!.month;
  return {
    id: 'monthly',
    heading: 'Interstitial condensation over a year',
    blocks: [
      {
        kind: 'paragraphs',
        paragraphs: [
          start === null
            ? `No month of the ${m.climateName} climate condenses, so nothing is stored.`
            : `Twelve months of the ${m.climateName} climate from ${start}${m.condensesEveryMonth ? ' (every month condenses with the element dry, so the calculation starts with the climate\'s first month)' : ', the first month to condense after one that does not'}; water stored at an interface dries out only as far as it is there.`,
        ],
      },
      {
        kind: 'figures',
        figures: [
          { label: 'Most condensate stored', value: m.maxAccumulated, quantity: 'massPerArea', ...(m.maxAccumulatedMonth ? { note: `${m.maxAccumulatedMonth}, ${m.maxAccumulatedPoint}` } : {}) },
          { label: 'Still stored after twelve months', value: m.remainingAtEnd, quantity: 'massPerArea' },
        ],
      },
      { kind: 'table', table },
      {
        kind: 'chart',
        chart: {
          title: 'Condensate stored month by month',
          x: { label: 'month', quantity: 'count', categories: months.map((month) => month.month) },
          y: { label: 'stored condensate', quantity: 'massPerArea' },
          series: [{ name: 'stored at the end of the month', points: months.map((month, k) => [k, month.totalAccumulated] as const) }],
          tabulatedIn: MONTHLY_TABLE,
        },
      },
    ],
  };
}

/** "in January", or "at the design condition": the checks' own wording, for the report's notes. */
export { conditionPhrase };
