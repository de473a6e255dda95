// Whether a pass still holds with a margin to spare and under the sensitivity runs: what a checker asks of a pass.
import type { LimitCheck } from '../impact/flood-limits';
import type { Metres } from '../units';
import { ROUTED_SENSITIVITY_DEFAULTS, type SensitivityCase, type SensitivityPercentages, type SensitivityReport } from './sensitivity';

export interface Robustness {
  /** 'robust' pass, 'not-robust' pass (see reasons), or 'fail'. */
  status: 'robust' | 'not-robust' | 'fail';
  minimumMargin: Metres;
  /** One line per reason a pass is not robust: a margin below the minimum, or a sensitivity run that fails. */
  reasons: string[];
  /** The verdict in words, e.g. "passes, but not robustly: fails if Manning's n is 20 % higher". */
  statement: string;
}

export function runWords(label: SensitivityCase['label'], p: SensitivityPercentages): string {
  switch (label) {
    case 'manning-n-up':
      return `Manning's n is ${p.manningN} % higher`;
    case 'manning-n-down':
      return `Manning's n is ${p.manningN} % lower`;
    case 'discharge-up':
      return `the discharge is ${p.discharge} % higher`;
    case 'coefficient-up':
      return `the weir coefficient is ${p.coefficient} % higher`;
    case 'coefficient-down':
      return `the weir coefficient is ${p.coefficient} % lower`;
    case 'storage-up':
      return `the reservoir holds ${p.storage ?? ROUTED_SENSITIVITY_DEFAULTS.storage} % more`;
    case 'storage-down':
      return `the reservoir holds ${p.storage ?? ROUTED_SENSITIVITY_DEFAULTS.storage} % less`;
    case 'volume-up':
      return `the flood's volume is ${p.hydrographVolume ?? ROUTED_SENSITIVITY_DEFAULTS.hydrographVolume} % larger at the same peak`;
    case 'volume-down':
      return `the flood's volume is ${p.hydrographVolume ?? ROUTED_SENSITIVITY_DEFAULTS.hydrographVolume} % smaller at the same peak`;
  }
}

/** The sensitivity runs of the governing event that break a limit (level + freeboard above the maximum level) or could not be computed. */
export function failingRuns(sensitivity: SensitivityReport, limits: readonly LimitCheck[], percentages: SensitivityPercentages): string[] {
  const failures: string[] = [];
  for (const run of sensitivity.cases) {
    const when = runWords(run.label, percentages);
    if (run.result === null) {
      failures.push(`cannot be computed if ${when} (${run.error ?? 'no answer'})`);
      continue;
    }
    const broken = limits
      .map((limit, i) => ({ limit, over: (run.result?.levelsAtLimits[i] ?? -Infinity) + limit.freeboard - limit.maxLevel }))
      .filter(({ over }) => over > 0);
    if (broken.length > 0) {
      failures.push(`fails if ${when} (${broken.map(({ limit, over }) => `${limit.label}: ${(over * 1000).toFixed(0)} mm over`).join('; ')})`);
    }
  }
  return failures;
}

export function robustness(input: {
  verdict: 'pass' | 'fail';
  /** Least margin over every event and limit, with where it occurs; null without limits. */
  least: { margin: Metres; event: string; limit: string } | null;
  minimumMargin: Metres;
  failures: readonly string[];
}): Robustness {
  const { verdict, least, minimumMargin } = input;
  if (verdict === 'fail') return { status: 'fail', minimumMargin, reasons: [], statement: 'fails' };
  const reasons: string[] = [];
  if (least !== null && least.margin < minimumMargin) {
    reasons.push(`the least margin, ${(least.margin * 1000).toFixed(0)} mm at ${least.limit} in ${least.event}, is below the minimum margin of ${(minimumMargin * 1000).toFixed(0)} mm`);
  }
  reasons.push(...input.failures);
  if (reasons.length === 0) return { status: 'robust', minimumMargin, reasons, statement: 'passes' };
  return { status: 'not-robust', minimumMargin, reasons, statement: `passes, but not robustly: ${reasons.join('; ')}` };
}
