import { describe, expect, it } from 'vitest';
import { historyCreate, historyPush, historyRedo, historySeal, historyUndo, HISTORY_MERGE_MS } from './history';

describe('parameter history', () => {
  it('undoes a whole slider drag in one step', () => {
    let h = historyCreate({ bustEase: -8 });
    h = historyPush(h, { bustEase: -9 }, 'bustEase', 0);
    for (let i = 1; i <= 20; i++) h = historyPush(h, { bustEase: -9 - i / 2 }, 'bustEase', i * 16);
    expect(h.present.bustEase).toBe(-19);
    h = historyUndo(h);
    expect(h.present.bustEase).toBe(-8);
    expect(h.past).toHaveLength(0);
  });

  it('keeps changes of different fields as separate steps', () => {
    let h = historyCreate({ a: 1, b: 1 });
    h = historyPush(h, { a: 2, b: 1 }, 'a', 0);
    h = historyPush(h, { a: 2, b: 2 }, 'b', 10);
    h = historyUndo(h);
    expect(h.present).toEqual({ a: 2, b: 1 });
    h = historyRedo(h);
    expect(h.present).toEqual({ a: 2, b: 2 });
  });

  it('starts a new step when the same field changes again after a pause or a seal', () => {
    let h = historyCreate(0);
    h = historyPush(h, 1, 'x', 0);
    h = historyPush(h, 2, 'x', HISTORY_MERGE_MS + 1);
    expect(h.past).toEqual([0, 1]);
    h = historySeal(h);
    h = historyPush(h, 3, 'x', HISTORY_MERGE_MS + 2);
    expect(h.past).toEqual([0, 1, 2]);
  });

  it('drops the redo steps when a new change is made after an undo', () => {
    let h = historyCreate(0);
    h = historyPush(h, 1, 'x', 0);
    h = historyUndo(h);
    expect(h.future).toEqual([1]);
    h = historyPush(h, 5, 'y', 10);
    expect(h.future).toEqual([]);
    expect(historyRedo(h)).toBe(h);
  });
});
