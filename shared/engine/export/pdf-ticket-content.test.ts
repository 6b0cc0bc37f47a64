import { describe, expect, it } from 'vitest';
import { draft as draftMake } from '../index';
import type { Draft, DraftInput } from '../types';
import { percentFormat, ticketContent, type TicketSection } from './pdf-ticket-content';
import { EXAMPLE_INPUT } from '../test-support/inputs';

function drafted(input: DraftInput): Draft {
  const result = draftMake(input);
  if (!result.ok) throw new Error(JSON.stringify(result.errors));
  return result.draft;
}

const inches = drafted(EXAMPLE_INPUT);

function section(sections: TicketSection[], heading: string): TicketSection {
  const found = sections.find((s) => s.heading === heading);
  if (!found) throw new Error(`no section ${heading}`);
  return found;
}

describe('ticketContent', () => {
  const content = ticketContent(inches, 'in', { client: 'Maren Holt', fabric: 'Cotton-spandex jersey' });
  const all = [...content.left, ...content.right, ...content.bottom];

  it('names the client, the style and the fabric with its stretch', () => {
    expect(content.title).toBe('Cutting ticket: Tank top for Maren Holt');
    const fabric = section(all, 'Fabric').rows!;
    expect(fabric).toContainEqual(['Fabric', 'Cotton-spandex jersey']);
    expect(fabric).toContainEqual(['Crosswise stretch', '40 %, recovery good']);
  });

  it('lists every piece with how many to cut', () => {
    expect(section(all, 'Pieces').rows).toEqual(inches.pieces.map((p) => [p.name, p.cutNote]));
  });

  it('gives the binding strips in the studio unit', () => {
    const rows = section(all, 'Binding strips to cut').rows!;
    expect(rows).toHaveLength(inches.bindings.length);
    // 1 in = 25.4 mm (NIST SP 811); figures to the nearest 1/8 in (common practice)
    const neck = inches.bindings.find((b) => b.opening === 'neck')!;
    const eighths = Math.round((neck.cutLength / 25.4) * 8);
    const whole = Math.floor(eighths / 8);
    const rest = eighths % 8;
    const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));
    const text = rest === 0 ? `${whole} in` : `${whole} ${rest / gcd(rest, 8)}/${8 / gcd(rest, 8)} in`;
    expect(rows[0]![1].startsWith(`${text} × `)).toBe(true);
  });

  it('shows lengths in centimetres for a metric studio', () => {
    const metric = ticketContent(inches, 'cm', {});
    const length = section(metric.left, 'Finished measurements').rows!.find((r) => r[0] === 'Length, shoulder to hem')!;
    // 25 in = 63.5 cm (NIST SP 811)
    expect(length[1]).toBe('63.5 cm');
    expect(metric.subtitle).toContain('lengths in centimetres');
  });

  it('puts the finishing steps in the trade order: overlock, bind, hem, press', () => {
    const steps = section(content.bottom, 'Finishing, in this order').lines!;
    const at = (word: RegExp) => steps.findIndex((s) => word.test(s));
    expect(at(/^Overlock/)).toBe(0);
    expect(at(/^Bind/)).toBeGreaterThan(at(/^Overlock/));
    expect(at(/^Hem/)).toBeGreaterThan(at(/^Bind/));
    expect(at(/^Press/)).toBeGreaterThan(at(/^Hem/));
  });

  it('shows the cautions of the trade and defers to local rules', () => {
    // trade.md "Cautions to show" (common practice)
    const cautions = section(content.bottom, 'Safety').lines!.join('\n');
    expect(cautions).toMatch(/Rotary cutter: close the guard/);
    expect(cautions).toMatch(/Overlocker: switch it off before threading/);
    expect(cautions).toMatch(/Steam iron: unplug it before refilling/);
    expect(cautions).toMatch(/flame: synthetics only.*ventilate/);
    expect(cautions).toMatch(/local safety rules and professional practice/);
  });

  it('gives the fold, fabric width and length needed', () => {
    const rows = section(content.right, 'Fold and cut').rows!;
    expect(rows.map((r) => r[0])).toEqual(['Fold', 'Fabric width used', 'Fabric length needed']);
    expect(section(content.right, 'Steps').lines).toEqual(inches.layout.steps);
  });

  it('formats percentages to 0.1 %', () => {
    expect(percentFormat(8.695652)).toBe('8.7 %');
    expect(percentFormat(-0.01)).toBe('0 %');
  });
});
