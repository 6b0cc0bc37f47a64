import { describe, expect, it } from 'vitest';
import { sandboxedHtml } from './sandboxed-html';

describe('sandboxedHtml', () => {
  it('puts the base target first in the head, where the HTML standard reads it', () => {
    expect(sandboxedHtml('<!doctype html><html><head><meta charset="utf-8"></head><body>x</body></html>')).toBe(
      '<!doctype html><html><head><base target="_blank"><meta charset="utf-8"></head><body>x</body></html>',
    );
  });

  it('adds it in front of a fragment that has no head', () => {
    expect(sandboxedHtml('<p>Hello</p>')).toBe('<base target="_blank"><p>Hello</p>');
  });
});
