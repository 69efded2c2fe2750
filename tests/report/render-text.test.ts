import { describe, expect, it } from 'vitest';
import { renderReportText } from '../../app/report/render-text.js';
import type { CaseReport } from '../../app/report/report-model.js';

// A small hand-made report: a 10 m run of insulated pipe, figures invented for the layout only.
const report: CaseReport = {
  kind: 'pipe',
  title: 'Brackwater test rig — return line (demo)',
  subject: 'Horizontal pipe, 60.3 × 2.9 mm steel; insulation 30.0 mm wool; indoors in still air.',
  keyFigures: [
    { label: 'Heat loss per metre', value: 18.234, quantity: 'heatFlowPerLength' },
    { label: 'U-value', value: 0.2842, quantity: 'uValue', note: 'unrounded 0.2842 W/(m²·K)' },
    { label: 'Touch limit', value: null, quantity: 'temperature' },
  ],
  verdicts: [
    { check: 'surface-condensation', title: 'Surface condensation', verdict: 'pass', margin: '18.6 K above the dew point', reason: 'No condensation.', caution: 'Mind the drips.' },
    { check: 'service-temperature', title: 'Service temperature', verdict: 'warning', reason: 'Close to a limit.', caution: 'Mind the drips.' },
    { check: 'personnel-protection', title: 'Personnel protection', verdict: 'fail', reason: 'Too hot.', caution: 'Hot surfaces burn.' },
  ],
  sections: [
    {
      id: 'build-up',
      heading: 'Build-up',
      blocks: [
        {
          kind: 'table',
          table: {
            title: 'Layers',
            columns: [{ label: 'Layer' }, { label: 'Thickness', quantity: 'thickness' }, { label: 'λ', quantity: 'conductivity' }],
            rows: [
              ['pipe wall', { value: 0.0029, quantity: 'thickness' }, { value: 50, quantity: 'conductivity' }],
              ['insulation', { value: 0.03, quantity: 'thickness' }, { value: null, quantity: 'conductivity' }],
            ],
          },
        },
        { kind: 'paragraphs', paragraphs: ['One short paragraph.'] },
        {
          kind: 'cross-section',
          crossSection: {
            title: 'To scale',
            geometry: 'cylinder',
            innerRadius: 0.0243,
            layers: [
              { name: 'pipe wall', category: 'pipe', thickness: 0.0029 },
              { name: 'insulation', category: 'insulation', thickness: 0.03 },
            ],
            temperatures: [80, 79.9, 31.25],
            tabulatedIn: 'Layers',
          },
        },
        {
          kind: 'chart',
          chart: {
            title: 'Temperature',
            x: { label: 'radius', quantity: 'position' },
            y: { label: 'temperature', quantity: 'temperature' },
            series: [{ name: 'temperature', points: [[0.0272, 80], [0.0602, 31.25]] }],
            tabulatedIn: 'Layers',
          },
        },
        {
          kind: 'chart',
          chart: {
            title: 'Stored water',
            x: { label: 'month', quantity: 'count', categories: ['October', 'November'] },
            y: { label: 'stored', quantity: 'massPerArea' },
            series: [
              { name: 'stored', points: [[0, 0.348], [1, 1.1592]] },
              { name: 'limit', points: [[0, 0.5], [1, 0.5]], reference: true },
            ],
            markers: [{ x: 1, label: 'heating starts' }],
          },
        },
      ],
    },
    { id: 'surface', heading: 'Outer surface', blocks: [{ kind: 'figures', figures: [{ label: 'Emissivity', value: 0.9, quantity: 'emissivity', note: 'from the jacket' }] }] },
  ],
  energyBalance: { residual: -3.7e-11, relativeResidual: 5.81e-13, quantity: 'heatFlowPerLength' },
  assumptions: ['Surroundings at the air temperature.'],
  warnings: [],
  sources: ['Touch limit: common practice, no source. ' + 'A long source sentence that goes on and on so that it has to wrap onto a second line of the plain text.'],
  cautions: ['Mind the drips.', 'Hot surfaces burn.'],
};

describe('renderReportText', () => {
  it('renders every part in reading order, with aligned columns, units in headers and each caution once', () => {
    expect(renderReportText(report)).toBe(
      [
        'Brackwater test rig — return line (demo)',
        'Horizontal pipe, 60.3 × 2.9 mm steel; insulation 30.0 mm wool; indoors in still air.',
        '',
        'Key figures',
        '  Heat loss per metre  18.2 W/m',
        '  U-value              0.28 W/(m²·K)  (unrounded 0.2842 W/(m²·K))',
        '  Touch limit          —',
        '',
        'Checks',
        '  PASS     Surface condensation: 18.6 K above the dew point',
        '           No condensation.',
        '  REVIEW   Service temperature',
        '           Close to a limit.',
        '  FAIL     Personnel protection',
        '           Too hot.',
        '',
        'Build-up',
        '  Layers',
        '    Layer       Thickness (mm)  λ (W/(m·K))',
        '    pipe wall              2.9         50.0',
        '    insulation            30.0            —',
        '',
        '  One short paragraph.',
        '',
        '  Cross-section "To scale": drawn on screen and in the printed report; the table "Layers" lists its',
        '  layers.',
        '',
        '  Chart "Temperature": drawn on screen and in the printed report; the table "Layers" lists its',
        '  figures.',
        '',
        '  Chart "Stored water", as figures:',
        '    month     stored (kg/m²)  limit (kg/m²)',
        '    October            0.348          0.500',
        '    November            1.16          0.500',
        '    marked at November: heating starts',
        '',
        'Outer surface',
        '  Emissivity  0.90  (from the jacket)',
        '',
        'Energy balance',
        '  Residual −3.70 × 10⁻¹¹ W/m, relative to the largest term 5.8 × 10⁻¹³.',
        '',
        'Assumptions',
        '  • Surroundings at the air temperature.',
        '',
        'Sources',
        '  • Touch limit: common practice, no source. A long source sentence that goes on and on so that it',
        '    has to wrap onto a second line of the plain text.',
        '',
        'Cautions',
        '  • Mind the drips.',
        '  • Hot surfaces burn.',
        '',
      ].join('\n'),
    );
  });

  it('leaves out empty lists and the headings of empty parts', () => {
    const bare = renderReportText({ ...report, keyFigures: [], verdicts: [], sections: [], assumptions: [], sources: [], cautions: [] });
    expect(bare).toBe(
      [
        'Brackwater test rig — return line (demo)',
        'Horizontal pipe, 60.3 × 2.9 mm steel; insulation 30.0 mm wool; indoors in still air.',
        '',
        'Energy balance',
        '  Residual −3.70 × 10⁻¹¹ W/m, relative to the largest term 5.8 × 10⁻¹³.',
        '',
      ].join('\n'),
    );
  });
});
