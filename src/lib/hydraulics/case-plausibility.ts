// Checks that a well-formed case also makes sense as a scheme: each finding names the field the designer typed.
import type { CaseInput } from '@/lib/validation/case-schema';
import type { ReachModel } from './case-reach';
import { InvalidInputError } from './errors';
import type { Metres } from './units';

/** AEP from a return period, AEP = 1 − e^(−1/T) (Langbein, "Annual floods and the partial-duration flood series", 1949). */
export function aepOfReturnPeriod(returnPeriodYears: number): number {
  return 1 - Math.exp(-1 / returnPeriodYears);
}

/** AEP and return period further apart than this (relative) are reported. */
const AEP_AGREEMENT = 0.05;

const pct = (p: number) => `${(p * 100).toPrecision(3)} %`;

function eventWarnings(input: CaseInput): string[] {
  const warnings: string[] = [];
  input.events.forEach((event, i) => {
    const { annualExceedanceProbability: aep, returnPeriod: t } = event;
    if (aep === undefined || t === undefined) return;
    const implied = aepOfReturnPeriod(t);
    if (Math.abs(aep - implied) / implied > AEP_AGREEMENT) {
      warnings.push(
        `events[${i}].returnPeriod: ${t} years gives an annual exceedance probability of ${pct(implied)} (AEP = 1 − e^(−1/T)), not the ${pct(aep)} given for "${event.name}"; check which is meant.`,
      );
    }
  });
  return warnings;
}

/** Lengths in the case's own units for messages: SI inside, feet for a US case. */
export interface LengthWords {
  toCaseUnits: (m: Metres) => number;
  unit: string;
}

const SI_WORDS: LengthWords = { toCaseUnits: (m) => m, unit: 'm' };

function limitsWithinReach(input: CaseInput, reachLength: Metres, words: LengthWords): void {
  const len = (m: Metres) => `${Number(words.toCaseUnits(m).toPrecision(6))} ${words.unit}`;
  input.limits.forEach((limit, i) => {
    if (limit.distanceUpstream > reachLength * (1 + 1e-12)) {
      throw new InvalidInputError(
        `limits[${i}].distanceUpstream`,
        `"${limit.label}" is ${len(limit.distanceUpstream)} upstream, beyond the upstream end of the reach (${len(reachLength)} from the structure); lengthen the reach or move the limit`,
      );
    }
  });
}

function structureFindings(input: CaseInput, model: ReachModel, words: LengthWords): string[] {
  const len = (m: Metres, digits = 3) => `${words.toCaseUnits(m).toFixed(digits)} ${words.unit}`;
  const control = input.control;
  if (control.type !== 'weir') return [];
  const bank = model.bankLevelAt?.(0);
  if (bank !== undefined && model.bedLevelAtControl + control.sillHeight > bank) {
    throw new InvalidInputError(
      'control.sillHeight',
      `puts the crest at ${len(model.bedLevelAtControl + control.sillHeight)}, above the bank at the structure (${len(bank)}): the structure would hold the water above the banks at any flow`,
    );
  }
  const crest = control.crestLength;
  if (crest === undefined || control.kind === 'rating-table') return [];
  const topWidth = model.controlSection.stateAtDepth(control.sillHeight).topWidth;
  if (topWidth > 0 && crest > topWidth * (1 + 1e-9)) {
    return [
      `control.crestLength: the crest (${len(crest, 2)}) is longer than the channel is wide at crest level (${len(topWidth, 2)}); this is right only for an oblique or folded crest, so check it.`,
    ];
  }
  return [];
}

function reservoirFindings(input: CaseInput, model: ReachModel, words: LengthWords): string[] {
  const reservoir = input.reservoir;
  if (reservoir === undefined) return [];
  const len = (m: Metres) => `${Number(words.toCaseUnits(m).toPrecision(6))} ${words.unit}`;
  const findings: string[] = [];
  if (reservoir.length !== undefined && reservoir.length > model.length) {
    findings.push(`reservoir.length: the reservoir (${len(reservoir.length)}) runs beyond the upstream end of the reach (${len(model.length)}); every limit is then checked against the peak reservoir level.`);
  }
  if (reservoir.startLevel !== undefined && input.control.type === 'weir' && reservoir.startLevel > model.bedLevelAtControl + input.control.sillHeight) {
    findings.push(`reservoir.startLevel: the flood starts with the reservoir above the crest (${len(reservoir.startLevel)} against a crest at ${len(model.bedLevelAtControl + input.control.sillHeight)}), already spilling; check that this is meant.`);
  }
  return findings;
}

/** Plausibility of the case as a whole: throws on what cannot be, returns warnings for what is unusual. */
export function casePlausibility(input: CaseInput, model: ReachModel, words: LengthWords = SI_WORDS): string[] {
  limitsWithinReach(input, model.length, words);
  const warnings = [...eventWarnings(input), ...structureFindings(input, model, words), ...reservoirFindings(input, model, words)];
  if (input.control.type === 'weir' && input.control.tailwaterLevel !== undefined) {
    warnings.push('control.tailwaterLevel is the old name of control.tailwaterDepth (it always held a depth above the bed); it was read as the depth. Rename it in the case file.');
  }
  return warnings;
}
