/**
 * Readable summaries of conduction results for `lamina solve --format text`. Figures are rounded
 * here, at the edge, for reading; the JSON output keeps full precision.
 */
import type { SteadyResult, TransientResult } from '../../../app/fe/index.js';
import { fixed, scientific } from './text-helpers.js';




export function conductionSteadyText(title: string, r: SteadyResult): string {
  const perBasis = r.basis === 'per-metre' ? 'W/m' : 'W/m²';
  const lines = [
    `${title}`,
    `Steady conduction, ${r.basis === 'per-metre' ? 'axisymmetric (per metre of pipe)' : 'planar (per m² of wall)'}; ${r.mesh.nodeCount} nodes, order ${r.mesh.order}, ${r.iterations} solve(s).`,
    '',
    `  Inner face  ${fixed(r.faces.inner.temperature, 2).padStart(9)} °C   heat in ${fixed(r.faces.inner.heatIn, 3).padStart(11)} ${perBasis}`,
    ...r.interfaces.map(
      (i) =>
        `  Interface ${String(i.index + 1).padEnd(2)}${fixed(i.temperatureInnerSide, 2).padStart(9)} °C   heat flow ${fixed(i.heatFlow, 3).padStart(9)} ${perBasis}` +
        (i.contactResistance > 0 ? `   (contact: ${fixed(i.temperatureOuterSide, 2)} °C beyond)` : ''),
    ),
    `  Outer face  ${fixed(r.faces.outer.temperature, 2).padStart(9)} °C   heat in ${fixed(r.faces.outer.heatIn, 3).padStart(11)} ${perBasis}`,
    '',
    `Energy balance: in through faces ${fixed(r.balance.heatInInner + r.balance.heatInOuter, 6)} + generated ${fixed(r.balance.generated, 6)} = residual ${scientific(r.balance.residual)} ${perBasis} (relative ${scientific(r.balance.relativeResidual)}).`,
    '',
  ];
  return lines.join('\n');
}

export function conductionTransientText(title: string, r: TransientResult): string {
  const perBasis = r.basis === 'per-metre' ? 'W/m' : 'W/m²';
  const last = r.temperatures.length - 1;
  const n = r.positions.length - 1;
  const sample = [...new Set([0, Math.round(last / 4), Math.round(last / 2), Math.round((3 * last) / 4), last])];
  const lines = [
    `${title}`,
    `Transient conduction, ${r.times.length - 1} steps to ${fixed(r.times[last]!, 0)} s; ${r.mesh.nodeCount} nodes.`,
    '',
    '      time s    inner °C    outer °C   heat in, inner   heat in, outer',
    ...sample.map((s) => {
      const qi = s === 0 ? '' : `${fixed(r.heatIn.inner[s - 1]!, 3)} ${perBasis}`;
      const qo = s === 0 ? '' : `${fixed(r.heatIn.outer[s - 1]!, 3)} ${perBasis}`;
      return `${fixed(r.times[s]!, 0).padStart(12)} ${fixed(r.temperatures[s]![0]!, 2).padStart(11)} ${fixed(r.temperatures[s]![n]!, 2).padStart(11)} ${qi.padStart(16)} ${qo.padStart(16)}`;
    }),
    '',
    `Energy balance over the run: stored ${fixed(r.balance.stored, 3)} J, net in ${fixed(r.balance.netIn, 3)} J ${r.basis === 'per-metre' ? 'per metre' : 'per m²'}; residual ${scientific(r.balance.residual)} (relative ${scientific(r.balance.relativeResidual)}).`,
    '',
  ];
  return lines.join('\n');
}
