import { describe, expect, it } from 'vitest';
import { fabricCreateSchema, type FabricView } from '@shared/schemas/fabric';
import { fabricFormValues, fabricSaveValues } from './fabric-values';

const jersey: FabricView = {
  id: 1,
  name: 'Ink cotton jersey',
  fibreContent: '95 % cotton, 5 % elastane',
  widthMm: 1530,
  weightGsm: 190,
  stretchCrosswise: 50,
  stretchLengthwise: 20,
  recovery: 'good',
  notes: null,
  version: 2,
  createdAt: '2026-01-05T10:00:00.000Z',
  updatedAt: '2026-01-05T10:00:00.000Z',
  studioUnit: 'in',
};

describe('fabric form values', () => {
  it('shows the width in the unit on screen (1530 mm = 60 1/4 in to the nearest 1/8, NIST SP 811)', () => {
    expect(fabricFormValues(jersey, 'in').width).toBe('60 1/4');
    expect(fabricFormValues(jersey, 'cm').width).toBe('153');
  });

  it('sends an untouched width back exactly in mm, and a re-typed one as typed', () => {
    const shown = fabricFormValues(jersey, 'in');
    expect(fabricSaveValues(shown, 'in', jersey).width).toBe('1530 mm');
    expect(fabricSaveValues({ ...shown, width: '58' }, 'in', jersey)).toMatchObject({ width: '58', unit: 'in' });
  });

  it('gives values the shared schema accepts', () => {
    const parsed = fabricCreateSchema.safeParse(fabricSaveValues(fabricFormValues(jersey, 'in'), 'in', jersey));
    expect(parsed.success).toBe(true);
    if (parsed.success) expect(parsed.data.widthMm).toBe(1530);
  });
});
