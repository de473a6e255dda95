import type { StructureStepInput } from '@/lib/validation/scheme-schemas';
import { pruned } from '../form-values';

export type StructureForm = {
  control: Record<string, unknown> & { kind?: string };
  existingControl?: { depth?: number };
};

/** The structure form's values as the schema expects them: a weir, blanks dropped, no depth-less existing control. */
export function cleanStructure(values: StructureForm): StructureStepInput {
  const control = pruned({ ...values.control, type: 'weir' });
  const depth = values.existingControl?.depth;
  return { control, ...(depth !== undefined && depth !== null ? { existingControl: { type: 'depth', depth } } : {}) } as StructureStepInput;
}

export const WEIR_KINDS = [
  { value: 'broad-crested', label: 'Broad-crested weir' },
  { value: 'sharp-crested', label: 'Sharp-crested (thin-plate) weir' },
  { value: 'ogee', label: 'Spillway with an ogee crest' },
] as const;
