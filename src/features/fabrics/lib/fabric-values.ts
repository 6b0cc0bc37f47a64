/** Between a stored fabric (mm, percent) and the form's typed values (the unit on screen). */
import { lengthFormat, type LengthUnit } from '@shared/units';
import type { FabricCreateInput, FabricView } from '@shared/schemas/fabric';

/** A new fabric's form: good recovery is the usual case, so it starts chosen. */
export function fabricFormEmpty(): Partial<FabricCreateInput> {
  return { name: '', fibreContent: '', width: '', weightGsm: null, stretchLengthwise: null, recovery: 'good', notes: '' };
}

/** The form's values for a stored fabric, the width written in `unit`. */
export function fabricFormValues(fabric: FabricView, unit: LengthUnit): FabricCreateInput {
  return {
    name: fabric.name,
    fibreContent: fabric.fibreContent ?? '',
    width: fabric.widthMm === null ? '' : lengthFormat(fabric.widthMm, unit, { withUnit: false }),
    weightGsm: fabric.weightGsm,
    stretchCrosswise: fabric.stretchCrosswise,
    stretchLengthwise: fabric.stretchLengthwise,
    recovery: fabric.recovery,
    notes: fabric.notes ?? '',
  };
}

/**
 * The values to send. A width left as it was shown goes back exactly as stored, in mm, so that
 * rounding for the screen never changes it.
 */
export function fabricSaveValues(values: FabricCreateInput, unit: LengthUnit, original?: FabricView): FabricCreateInput {
  const width = values.width;
  if (original?.widthMm != null && typeof width === 'string' && width.trim() === lengthFormat(original.widthMm, unit, { withUnit: false })) {
    return { ...values, unit, width: `${original.widthMm} mm` };
  }
  return { ...values, unit };
}
