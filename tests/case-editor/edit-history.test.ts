/** Undo and redo over case snapshots. */
import { describe, expect, it } from 'vitest';
import { EditHistory } from '../../renderer/src/case-editor/edit-history.js';

describe('edit history', () => {
  it('steps back and forward through snapshots, and a new edit clears what could be redone', () => {
    const history = new EditHistory<string>();
    history.record('a');
    history.record('b');
    expect(history.undo('c')).toBe('b');
    expect(history.undo('b')).toBe('a');
    expect(history.undo('a')).toBeUndefined();
    expect(history.redo('a')).toBe('b');
    expect(history.canRedo).toBe(true);
    history.record('b');
    expect(history.canRedo).toBe(false);
    expect(history.redo('x')).toBeUndefined();
  });

  it('makes typing in one box one step until the box is left', () => {
    const history = new EditHistory<string>();
    history.record('5', 'thickness');
    history.record('50', 'thickness');
    history.record('500', 'thickness');
    expect(history.undo('50')).toBe('5');
    expect(history.canUndo).toBe(false);
    history.record('5', 'thickness');
    history.seal();
    history.record('6', 'thickness');
    expect(history.undo('7')).toBe('6');
    expect(history.undo('6')).toBe('5');
  });

  it('keeps at most its limit of steps, dropping the oldest', () => {
    const history = new EditHistory<number>(3);
    for (let i = 0; i < 5; i++) history.record(i);
    expect([history.undo(5), history.undo(4), history.undo(3), history.undo(2)]).toEqual([4, 3, 2, undefined]);
  });
});
