/** Labels along a line: in order, at least the gap apart, inside the bounds, as near their targets as that allows. */
import { describe, expect, it } from 'vitest';
import { spreadLabels } from '../../app/report/drawing/label-spread.js';

describe('spreadLabels', () => {
  it('leaves labels with room where they are', () => {
    expect(spreadLabels([10, 50, 90], 20, 0, 100)).toEqual([10, 50, 90]);
  });

  it('pushes crowded labels apart to the gap, keeping their order', () => {
    // Three interfaces 1 px apart (a thin membrane between two boards) and one far away.
    expect(spreadLabels([40, 41, 42, 90], 20, 0, 100)).toEqual([40, 60, 80, 100]);
  });

  it('pulls labels back from the far end where they would overflow', () => {
    expect(spreadLabels([95, 96, 97], 10, 0, 100)).toEqual([80, 90, 100]);
  });

  it('keeps labels inside the bounds', () => {
    expect(spreadLabels([-5, 105], 10, 0, 100)).toEqual([0, 100]);
  });

  it('spaces labels evenly from end to end when the line is too short for the gap', () => {
    expect(spreadLabels([50, 50, 50], 80, 0, 100)).toEqual([0, 50, 100]);
    expect(spreadLabels([30], 80, 0, 10)).toEqual([10]);
  });
});
