/**
 * The JSON Schemas in data/schemas state the same finite ranges that `lamina solve` enforces
 * (app/base/quantity-ranges.ts, app/api/material-limits.ts, app/cases/insulated/insulated-inputs.ts
 * and the per-kind checks), so a file a schema-aware editor accepts is a file the command solves.
 *
 * (a) Every number in every schema has a finite lower and upper bound.
 * (b) For every example in data/examples and every numeric leaf in it, the leaf is set just inside
 *     and just outside each bound its schema states (the bound itself when it is inclusive), and
 *     to 1e308, −1e308 and 1e-30; ajv (draft 2020-12) must accept exactly when `lamina solve` exits
 *     0, and the command must exit 0 or 2. Rules between fields, which a schema cannot state, are
 *     the few exceptions listed in CROSS_FIELD_RULES below, each checked by its own condition.
 */
import { readdirSync, readFileSync, rmSync } from 'node:fs';
import path from 'node:path';
import Ajv2020Module from 'ajv/dist/2020.js';
import { afterAll, describe, expect, it } from 'vitest';
import { caseFileWriter, runLamina, temporaryFolder } from './in-process-cli.js';

const root = path.resolve(__dirname, '..', '..');
const schemaDir = path.join(root, 'data', 'schemas');
const examplesDir = path.join(root, 'data', 'examples');
const examples = readdirSync(examplesDir).filter((f) => f.endsWith('.json'));

type Json = Record<string, unknown>;
const isObject = (v: unknown): v is Json => typeof v === 'object' && v !== null && !Array.isArray(v);
const readJson = (file: string): unknown => JSON.parse(readFileSync(file, 'utf8'));

// ajv's CommonJS default export, as NodeNext module resolution sees it.
const Ajv2020 = Ajv2020Module.default;

/** Every schema by its $id, registered with one ajv (as tests/cli/solve.test.ts does). */
const schemas = new Map<string, Json>();
const ajv = new Ajv2020({ allErrors: false, strict: false });
for (const file of readdirSync(schemaDir).filter((f) => f.endsWith('.json'))) {
  const schema = readJson(path.join(schemaDir, file)) as Json;
  schemas.set(schema['$id'] as string, schema);
  ajv.addSchema(schema);
}
const caseSchemaId = 'https://lamina.invalid/schemas/case.schema.json';
const validateCase = ajv.getSchema(caseSchemaId)!;

// ---------------------------------------------------------------------------------------------
// (a) finite bounds on every number

interface NumberNode {
  readonly where: string;
  readonly node: Json;
}

function isNumberType(type: unknown): boolean {
  const types = Array.isArray(type) ? type : [type];
  return types.includes('number') || types.includes('integer');
}

/** Every schema object anywhere in `value` whose type is number or integer. */
function numberNodes(value: unknown, where: string, out: NumberNode[] = []): NumberNode[] {
  if (Array.isArray(value)) value.forEach((v, i) => numberNodes(v, `${where}/${i}`, out));
  if (!isObject(value)) return out;
  if (isNumberType(value['type'])) out.push({ where, node: value });
  for (const [key, v] of Object.entries(value)) numberNodes(v, `${where}/${key}`, out);
  return out;
}

const lowerOf = (n: Json) => (n['minimum'] ?? n['exclusiveMinimum']) as number | undefined;
const upperOf = (n: Json) => (n['maximum'] ?? n['exclusiveMaximum']) as number | undefined;

describe('(a) every number in every schema has a finite range', () => {
  for (const [id, schema] of schemas) {
    it(path.basename(id), () => {
      const nodes = numberNodes(schema, '#');
      const unbounded = nodes
        .filter(({ node }) => !(Number.isFinite(lowerOf(node)) && Number.isFinite(upperOf(node)) && lowerOf(node)! <= upperOf(node)!))
        .map(({ where }) => where);
      expect(unbounded).toEqual([]);
      // case.schema.json only combines the others and holds no number of its own.
      if (!id.endsWith('/case.schema.json')) expect(nodes.length).toBeGreaterThan(5);
    });
  }
});

// ---------------------------------------------------------------------------------------------
// (b) schema and command agree at every bound

/** A place in a schema: the schema's $id and a JSON pointer into it. */
interface SchemaPlace {
  readonly id: string;
  readonly pointer: string;
  readonly node: unknown;
}

function inside(place: SchemaPlace, ...keys: string[]): SchemaPlace {
  let node = place.node;
  for (const key of keys) node = (node as Record<string, unknown>)[key];
  return { id: place.id, pointer: `${place.pointer}/${keys.join('/')}`, node };
}

function referenced(place: SchemaPlace, ref: string): SchemaPlace {
  const url = new URL(ref, place.id);
  const id = `${url.origin}${url.pathname}`;
  const base: SchemaPlace = { id, pointer: '', node: schemas.get(id) };
  const pointer = decodeURIComponent(url.hash.slice(1));
  return pointer === '' ? base : inside(base, ...pointer.split('/').slice(1));
}

function satisfies(place: SchemaPlace, value: unknown): boolean {
  const validate = ajv.getSchema(place.pointer === '' ? place.id : `${place.id}#${place.pointer}`);
  if (!validate) throw new Error(`no schema at ${place.id}#${place.pointer}`);
  return validate(value) as boolean;
}

/** `place` and every subschema that applies to `value` there: $ref, allOf, and the anyOf/oneOf branches it satisfies. */
function applying(place: SchemaPlace, value: unknown): SchemaPlace[] {
  const node = place.node;
  if (!isObject(node)) return [];
  const out = [place];
  if (typeof node['$ref'] === 'string') out.push(...applying(referenced(place, node['$ref']), value));
  for (const keyword of ['allOf', 'anyOf', 'oneOf']) {
    const branches = node[keyword];
    if (!Array.isArray(branches)) continue;
    branches.forEach((_, i) => {
      const branch = inside(place, keyword, String(i));
      if (keyword === 'allOf' || satisfies(branch, value)) out.push(...applying(branch, value));
    });
  }
  return out;
}

/** The subschemas that apply to the child `key` of a value the `parents` apply to. */
function childPlaces(parents: readonly SchemaPlace[], key: string | number, child: unknown): SchemaPlace[] {
  const out: SchemaPlace[] = [];
  for (const parent of parents) {
    const node = parent.node as Json;
    if (typeof key === 'string' && isObject(node['properties']) && key in node['properties']) {
      out.push(...applying(inside(parent, 'properties', key), child));
    }
    if (typeof key === 'number') {
      const prefix = node['prefixItems'];
      if (Array.isArray(prefix) && key < prefix.length) out.push(...applying(inside(parent, 'prefixItems', String(key)), child));
      else if (isObject(node['items'])) out.push(...applying(inside(parent, 'items'), child));
    }
  }
  return out;
}

interface Bounds {
  readonly low: number;
  readonly lowExclusive: boolean;
  readonly high: number;
  readonly highExclusive: boolean;
  readonly integer: boolean;
}

/** The range the schema states for a number, from the subschemas that apply to it. */
function boundsOf(places: readonly SchemaPlace[]): Bounds | undefined {
  let bounds: Bounds | undefined;
  for (const { node } of places) {
    const n = node as Json;
    if (typeof n['const'] === 'number') return { low: n['const'], lowExclusive: false, high: n['const'], highExclusive: false, integer: true };
    if (lowerOf(n) === undefined || upperOf(n) === undefined) continue;
    bounds = {
      low: lowerOf(n)!,
      lowExclusive: n['minimum'] === undefined,
      high: upperOf(n)!,
      highExclusive: n['maximum'] === undefined,
      integer: n['type'] === 'integer',
    };
  }
  return bounds;
}

type Path = readonly (string | number)[];

interface Leaf {
  readonly path: Path;
  readonly value: number;
  readonly bounds: Bounds | undefined;
}

/** Every number in `value` with the range its schema states. */
function numericLeaves(value: unknown, places: readonly SchemaPlace[], at: Path = [], out: Leaf[] = []): Leaf[] {
  if (typeof value === 'number') out.push({ path: at, value, bounds: boundsOf(places) });
  const entries: [string | number, unknown][] = Array.isArray(value) ? value.map((v, i) => [i, v]) : isObject(value) ? Object.entries(value) : [];
  for (const [key, child] of entries) numericLeaves(child, childPlaces(places, key, child), [...at, key], out);
  return out;
}

const pathText = (p: Path) => p.map((k) => (typeof k === 'number' ? `[${k}]` : `.${k}`)).join('').slice(1);

function withValue(json: unknown, at: Path, value: number): Json {
  const copy = structuredClone(json) as Json;
  let node: Record<string | number, unknown> = copy;
  for (const key of at.slice(0, -1)) node = node[key] as Record<string | number, unknown>;
  node[at[at.length - 1]!] = value;
  return copy;
}

interface Probe {
  readonly label: string;
  readonly value: number;
}

/**
 * Just inside and just outside each bound: the bound itself and one step beyond it when the bound
 * is inclusive, one step within it and the bound itself when exclusive. A step is 1 for whole
 * numbers, otherwise a billionth of the bound (or 1e-9 at a bound of 0).
 */
function probesFor(bounds: Bounds): Probe[] {
  const step = (b: number) => (bounds.integer ? 1 : b === 0 ? 1e-9 : Math.abs(b) * 1e-9);
  const { low, high } = bounds;
  const probes: Probe[] = [
    { label: 'just inside the lower bound', value: bounds.lowExclusive ? low + step(low) : low },
    { label: 'just outside the lower bound', value: bounds.lowExclusive ? low : low - step(low) },
    { label: 'just inside the upper bound', value: bounds.highExclusive ? high - step(high) : high },
    { label: 'just outside the upper bound', value: bounds.highExclusive ? high : high + step(high) },
    { label: '1e308', value: 1e308 },
    { label: '-1e308', value: -1e308 },
    { label: '1e-30', value: 1e-30 },
  ];
  return probes.filter((p, i) => probes.findIndex((q) => q.value === p.value) === i);
}

// ---------------------------------------------------------------------------------------------
// Rules between fields that no JSON Schema can state: the schema accepts each field alone, the
// command refuses the combination. Each names the condition it excuses, checked on the case as
// probed, and the refusal the command must give; a rule no probe needs fails the last test.

interface CrossFieldRule {
  readonly rule: string;
  readonly breaks: (json: Json) => boolean;
  readonly refusal: RegExp;
}

const get = (json: unknown, ...keys: (string | number)[]): unknown =>
  keys.reduce<unknown>((v, k) => (v === null || typeof v !== 'object' ? undefined : (v as Record<string | number, unknown>)[k]), json);

/** Every object in `json` (depth first), for rules that hold wherever a structure appears. */
function objectsIn(json: unknown, out: Json[] = []): Json[] {
  if (Array.isArray(json)) json.forEach((v) => objectsIn(v, out));
  if (isObject(json)) {
    out.push(json);
    Object.values(json).forEach((v) => objectsIn(v, out));
  }
  return out;
}

/** λ(θ) of a polynomial, as app/fe/conductivity.ts evaluates it. */
const polynomialAt = (coefficients: readonly number[], t: number) => coefficients.reduceRight((sum, a) => sum * t + a, 0);

/** The temperatures a conduction case names: fixed faces, film ambients and the starting temperature. */
function namedTemperatures(json: Json): number[] {
  const named: unknown[] = [get(json, 'inner', 'temperature'), get(json, 'inner', 'ambient'), get(json, 'outer', 'temperature'), get(json, 'outer', 'ambient')];
  if (get(json, 'analysis', 'kind') === 'transient') named.push(get(json, 'analysis', 'initialTemperature'));
  return named.filter((t): t is number => typeof t === 'number');
}

const CROSS_FIELD_RULES: readonly CrossFieldRule[] = [
  {
    // The schema bounds the wall by the largest pipe (below 2.5 m); the code by this pipe's radius.
    rule: 'pipe.wallThickness must be less than half of pipe.outerDiameter',
    breaks: (json) => {
      const d = get(json, 'pipe', 'outerDiameter');
      const wall = get(json, 'pipe', 'wallThickness');
      return typeof d === 'number' && typeof wall === 'number' && !(wall < d / 2);
    },
    refusal: /^lamina solve: pipe\.wallThickness must be at least 0\.000001 m and less than half of pipe\.outerDiameter/,
  },
  {
    // app/fe/validate.ts: at most 1e6 time steps, whatever timeStep and duration are alone.
    rule: 'analysis.duration / analysis.timeStep must give at most 1e6 steps',
    breaks: (json) => {
      const dt = get(json, 'analysis', 'timeStep');
      const duration = get(json, 'analysis', 'duration');
      return typeof dt === 'number' && typeof duration === 'number' && Math.ceil(duration / dt - 1e-9) > 1e6;
    },
    refusal: /^lamina solve: timeStep must give at most 1000000 steps over the duration/,
  },
  {
    // A conductivity table is read in rising temperature; the schema cannot compare list entries.
    rule: "a conductivity table's temperatures must rise from point to point",
    breaks: (json) =>
      objectsIn(json).some((o) => o['kind'] === 'table' && Array.isArray(o['points']) && o['points'].some((p, i, all) => i > 0 && !(p[0] > all[i - 1][0]))),
    refusal: /\.points\[\d+\]\[0\] must be above the previous point's temperature/,
  },
  {
    // app/materials/conductivity-checks.ts samples λ at 65 temperatures between the lowest and
    // highest a conduction case names; the schema holds each coefficient and temperature alone.
    rule: "a conduction polynomial λ(θ) must stay within 0.001 to 1000 W/(m·K) over the case's temperatures",
    breaks: (json) => {
      const named = namedTemperatures(json);
      if (json['kind'] !== 'conduction' || named.length === 0) return false;
      const [low, high] = [Math.min(...named), Math.max(...named)];
      return objectsIn(json).some((o) => {
        if (o['kind'] !== 'polynomial') return false;
        for (let i = 0; i <= 64; i++) {
          const k = polynomialAt(o['coefficients'] as number[], low + ((high - low) * i) / 64);
          if (!(k >= 0.001 && k <= 1000)) return true;
        }
        return false;
      });
    },
    refusal: /^lamina solve: layers\[\d+\]\.conductivity gives .* W\/\(m·K\) at .* °C, but must stay at least 0\.001 and at most 1000 W\/\(m·K\) over the case's temperatures/,
  },
  {
    rule: "a material's maxServiceTemperature must be above its minServiceTemperature",
    breaks: (json) =>
      objectsIn(json).some((o) => typeof o['minServiceTemperature'] === 'number' && typeof o['maxServiceTemperature'] === 'number' && !(o['minServiceTemperature'] < o['maxServiceTemperature'])),
    refusal: /\.maxServiceTemperature must be above .*\.minServiceTemperature/,
  },
  {
    // ISO 6946 classes a ventilated air layer by its opening area; the case names both.
    rule: "an air layer's openingArea must agree with its ventilation class",
    breaks: (json) =>
      objectsIn(json).some((o) => {
        const a = o['openingArea'];
        if (o['kind'] !== 'air-layer' || typeof a !== 'number') return false;
        const implied = a <= 500 ? 'unventilated' : a <= 1500 ? 'slightly-ventilated' : 'well-ventilated';
        return implied !== o['ventilation'];
      }),
    refusal: /^lamina solve: layers\[\d+\]\.ventilation is '.*' but an opening area of .* makes the layer '.*'/,
  },
  {
    // The schema bounds the index alone; the code by the case's own list of layers.
    rule: 'sizing.layer must be the index of one of the case\'s layers',
    breaks: (json) => {
      const layer = get(json, 'sizing', 'layer');
      const layers = get(json, 'layers');
      return typeof layer === 'number' && Array.isArray(layers) && layer >= layers.length;
    },
    refusal: /^lamina solve: sizing\.layer must be a whole number from 0 to \d+, the index of an insulation layer in layers/,
  },
  {
    // An installed-cost table prices the thicknesses (and pipe sizes) it lists and does not
    // extrapolate; the schema cannot see the table, which is data (data/sizing/installed-costs.csv).
    rule: 'every thickness sized, and the pipe, must lie within the named installed-cost table',
    breaks: (json) => {
      const rows = COST_ROWS.filter((r) => r.table === get(json, 'sizing', 'economics', 'costTable'));
      if (rows.length === 0) return false;
      const d = get(json, 'pipe', 'outerDiameter');
      const layerIndex = get(json, 'sizing', 'layer');
      const listed = get(json, 'sizing', 'series', 'thicknesses');
      const thicknesses = [get(json, 'layers', typeof layerIndex === 'number' ? layerIndex : 0, 'thickness'), ...(Array.isArray(listed) ? listed : [])].filter((t): t is number => typeof t === 'number');
      const outside = (values: readonly number[], v: number) => v < Math.min(...values) || v > Math.max(...values);
      return (typeof d === 'number' && rows[0]!.diameter !== null && outside(rows.map((r) => r.diameter!), d)) || thicknesses.some((t) => outside(rows.map((r) => r.thickness), t));
    },
    refusal: /^lamina solve: sizing\.economics\.costTable '.*' covers (thicknesses|pipe outer diameters) from .* so it gives no cost for .* \(it does not extrapolate\)/,
  },
];

/** The shipped installed-cost rows, read here from the CSV's first columns (none of them quoted). */
const COST_ROWS = readFileSync(path.join(root, 'data', 'sizing', 'installed-costs.csv'), 'utf8')
  .split('\n').slice(1).filter((line) => line.trim() !== '')
  .map((line) => {
    const [table, , diameter, thickness] = line.split(',');
    return { table: table!, diameter: diameter === '' ? null : Number(diameter) / 1000, thickness: Number(thickness) / 1000 };
  });

const ruleUses = new Map<string, number>(CROSS_FIELD_RULES.map((r) => [r.rule, 0]));

const caseFolder = temporaryFolder('lamina-schema-ranges-');
const writeCase = caseFileWriter(caseFolder);
afterAll(() => rmSync(caseFolder, { recursive: true, force: true }));

describe('(b) ajv and lamina solve agree at every bound of every numeric leaf of the examples', () => {
  for (const file of examples) {
    it(file, async () => {
      const example = readJson(path.join(examplesDir, file)) as Json;
      expect(validateCase(example), `${file} itself must validate`).toBe(true);
      const leaves = numericLeaves(example, applying({ id: caseSchemaId, pointer: '', node: schemas.get(caseSchemaId) }, example));
      expect(leaves.length).toBeGreaterThan(5);
      expect(leaves.filter((l) => l.bounds === undefined).map((l) => pathText(l.path))).toEqual([]);

      const disagreements: string[] = [];
      for (const leaf of leaves) {
        for (const probe of probesFor(leaf.bounds!)) {
          const json = withValue(example, leaf.path, probe.value);
          const schemaAccepts = validateCase(json) as boolean;
          const run = await runLamina(['solve', writeCase(json)], { db: path.join(caseFolder, 'library.sqlite') });
          const where = `${pathText(leaf.path)} = ${probe.value} (${probe.label})`;
          const outcome = `exit ${run.code}: ${run.stderr.trim()}`;
          if ((run.code === 0 || run.code === 2) && schemaAccepts === (run.code === 0)) continue;
          const excuse = schemaAccepts && run.code === 2 ? CROSS_FIELD_RULES.find((r) => r.breaks(json) && r.refusal.test(run.stderr)) : undefined;
          if (excuse) {
            ruleUses.set(excuse.rule, ruleUses.get(excuse.rule)! + 1);
            continue;
          }
          disagreements.push(`${where}: schema ${schemaAccepts ? 'accepts' : 'refuses'}, lamina solve ${outcome}`);
        }
      }
      expect(disagreements).toEqual([]);
      // Every probe the command accepts runs the whole case, its sizing included: the freeze example
      // simulates its water freezing at two thicknesses per probe, about 30 s in all on a busy machine.
    }, 240_000);
  }

  it('every cross-field exception was needed by at least one probe', () => {
    expect([...ruleUses].filter(([, uses]) => uses === 0).map(([rule]) => rule)).toEqual([]);
  });
});
