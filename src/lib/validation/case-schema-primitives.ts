import { z } from 'zod';
import { singleLineText } from './plain-text';

// The smallest pieces of the case-file schema: units for messages, and numbers and texts with practitioners' messages.

export interface UnitLabels {
  length: string;
  discharge: string;
  area: string;
  volume: string;
}

export type CaseUnits = 'SI' | 'US';

export const UNIT_LABELS: Record<CaseUnits, UnitLabels> = {
  SI: { length: 'm', discharge: 'm³/s', area: 'm²', volume: 'm³' },
  US: { length: 'ft', discharge: 'ft³/s', area: 'ft²', volume: 'ft³' },
};

export const missingOr = (kind: string) => (issue: { input: unknown }) => (issue.input === undefined ? 'is required' : `must be ${kind}`);

export const finite = (unit?: string) => z.number({ error: missingOr(unit ? `a number (${unit})` : 'a number') });
export const positive = (unit?: string) => finite(unit).positive({ error: `must be greater than 0${unit ? ` ${unit}` : ''}` });
export const nonNegative = (unit?: string) => finite(unit).nonnegative({ error: `must be 0${unit ? ` ${unit}` : ''} or more` });
/** A list too long for the engine: the message says how many are allowed and how many were sent. */
export const atMost = (max: number, per: string) => (issue: { input: unknown }) =>
  `are too many: at most ${max} ${per}${Array.isArray(issue.input) ? ` (this one has ${issue.input.length}); reduce them to ${max} or fewer` : ''}`;
export const text = (what: string) => singleLineText(what, { missing: 'is required' }).min(1, { error: `must not be empty (${what})` });
