// Finding the highest sill, or the shortest crest, for which every flood limit still passes.
import { EngineError, InvalidInputError, requireFinite, requirePositive } from '../errors';
import type { Metres } from '../units';

export interface CrestSizingInput {
  /** True when every limit passes for every event at this sill level or crest length; must be monotone in the value. */
  passes: (value: Metres) => boolean;
  lower: Metres;
  upper: Metres;
  /** The answer is a multiple of this, rounded to the safe side (default 0.01 m). */
  increment?: Metres;
  /** 'highest-passing' for a sill level (higher fails); 'lowest-passing' for a crest length (shorter fails). */
  direction: 'highest-passing' | 'lowest-passing';
}

export interface CrestSizingResult {
  value: Metres | null;
  reason: string;
  evaluations: number;
}

const MAX_GRID_STEPS = 2 ** 40;

/**
 * Bisection over the multiples of `increment` inside [lower, upper]. Because only grid values are ever tried and
 * the bracket always keeps one passing and one failing grid value, the answer is itself a value that was
 * evaluated and passed: rounded down for 'highest-passing', up for 'lowest-passing'. A case the engine cannot
 * compute (an EngineError, e.g. a weir drowned out or a section overtopped) counts as not passing.
 */
export function sizeCrest(input: CrestSizingInput): CrestSizingResult {
  const increment = input.increment ?? 0.01;
  requirePositive(increment, 'sizing.increment');
  requireFinite(input.lower, 'sizing.lower');
  requireFinite(input.upper, 'sizing.upper');
  if (input.upper < input.lower) throw new InvalidInputError('sizing.upper', 'must not be below sizing.lower');
  const first = Math.ceil(input.lower / increment - 1e-9);
  const last = Math.floor(input.upper / increment + 1e-9);
  if (last < first) throw new InvalidInputError('sizing.increment', `no multiple of ${increment} lies between ${input.lower} and ${input.upper}`);
  if (last - first > MAX_GRID_STEPS) throw new InvalidInputError('sizing.increment', 'is too fine for the range searched');

  let evaluations = 0;
  let lastError: string | null = null;
  const valueAt = (k: number) => Number((k * increment).toPrecision(12));
  const passesAt = (k: number): boolean => {
    evaluations++;
    try {
      return input.passes(valueAt(k));
    } catch (error) {
      if (!(error instanceof EngineError)) throw error;
      lastError = error.message;
      return false;
    }
  };
  const because = () => (lastError === null ? '' : ` (last engine error: ${lastError})`);

  const highest = input.direction === 'highest-passing';
  const safeEnd = highest ? first : last;
  const riskyEnd = highest ? last : first;
  if (!passesAt(safeEnd)) {
    return { value: null, reason: `no value in range passes: even ${valueAt(safeEnd)} fails${because()}`, evaluations };
  }
  if (passesAt(riskyEnd)) {
    return { value: valueAt(riskyEnd), reason: `every value in range passes, so the range's ${highest ? 'upper' : 'lower'} end ${valueAt(riskyEnd)} governs`, evaluations };
  }
  let passing = safeEnd;
  let failing = riskyEnd;
  while (Math.abs(failing - passing) > 1) {
    const mid = Math.floor((passing + failing) / 2);
    if (passesAt(mid)) passing = mid;
    else failing = mid;
  }
  const verb = highest ? 'highest' : 'lowest';
  return { value: valueAt(passing), reason: `${valueAt(passing)} is the ${verb} passing value; ${valueAt(failing)} fails${because()}`, evaluations };
}
