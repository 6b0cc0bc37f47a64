import { afterEach, describe, expect, it } from 'vitest';
import { displayUnitGet, displayUnitRead, displayUnitReset, displayUnitSet, studioUnitDefaultSet } from './unit';

afterEach(() => {
  displayUnitReset();
  studioUnitDefaultSet('in');
});

describe('the display unit', () => {
  it('follows the studio’s default until someone switches', () => {
    studioUnitDefaultSet('cm');
    expect(displayUnitGet()).toBe('cm');
    studioUnitDefaultSet('in');
    expect(displayUnitGet()).toBe('in');
  });

  it('keeps a switch over the studio’s default until reset', () => {
    studioUnitDefaultSet('in');
    displayUnitSet('cm');
    expect(displayUnitGet()).toBe('cm');
    studioUnitDefaultSet('in');
    expect(displayUnitGet()).toBe('cm');
    displayUnitReset();
    expect(displayUnitGet()).toBe('in');
  });

  it('ignores a stored value that is not a unit', () => {
    expect(displayUnitRead('cm')).toBe('cm');
    expect(displayUnitRead('mm')).toBeNull();
    expect(displayUnitRead(null)).toBeNull();
  });
});
