import { describe, expect, it } from 'vitest';
import { fileSlug, printDate, printFileName } from './file-download';

describe('file names', () => {
  it('keeps letters and digits, drops accents and everything else', () => {
    expect(fileSlug('Clémentine  Rusk / O’Neil')).toBe('clementine-rusk-o-neil');
    expect(fileSlug('***')).toBe('');
  });

  it('names the document by style, client, kind and paper', () => {
    expect(printFileName('Scoop tank', 'Marisol Venn', 'tiles', 'a4')).toBe('scoop-tank-marisol-venn-tiles-a4.pdf');
    expect(printFileName('Racer tank', 'Ines Fairweather', 'pieces', 'full-size', 'svg')).toBe('racer-tank-ines-fairweather-pieces-full-size.svg');
  });

  it('writes the date in words', () => {
    expect(printDate(new Date(2026, 11, 2, 12))).toBe('2 December 2026');
  });
});
