/** A revision's changes in the studio's words and unit: "Bust ease −8 % → −10 %". */
import type { DraftChange } from '@shared/schemas/draft-dto';
import { lengthFormat, type LengthUnit } from '@shared/units';
import { percentText } from './figures';
import { PARAM_FIELDS } from './param-fields';

const OTHER_FIELDS: Record<string, string> = {
  fabricId: 'Fabric',
  blockId: 'Block',
  styleId: 'Style',
  dueOn: 'Due date',
  notes: 'Notes',
  'params.edgeFinish': 'Edge finish',
};

function valueText(change: DraftChange, value: DraftChange['from'], unit: LengthUnit): string {
  if (value === null) return 'default';
  const field = PARAM_FIELDS.find((f) => f.path === change.field);
  if (!field || typeof value !== 'number') return String(value);
  if (field.kind === 'length') return lengthFormat(value, unit);
  if (field.kind === 'percent') return percentText(value, false);
  return value.toFixed(2);
}

export function changeText(change: DraftChange, unit: LengthUnit): string {
  const field = PARAM_FIELDS.find((f) => f.path === change.field);
  const label = field?.label ?? OTHER_FIELDS[change.field] ?? change.field;
  if (change.field === 'notes') return 'Notes changed';
  if (/Id$/.test(change.field)) return `${label} changed`;
  return `${label} ${valueText(change, change.from, unit)} → ${valueText(change, change.to, unit)}`;
}
