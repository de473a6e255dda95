import type { CaseResult, LimitResult } from '@/lib/hydraulics/case-result';
import { runWords } from '@/lib/hydraulics/design/robustness';
import { ROUTED_SENSITIVITY_DEFAULTS } from '@/lib/hydraulics/design/sensitivity';
import { fixed, lengthUnit, levelUnit, pdfText } from './certificate-text';
import { FAIL, INK, type Doc, type Row, contentWidth, heading, paragraph, table } from './pdf-layout';

const HEADING = 'Sensitivity and robustness of the verdict';
/** The table's header and its first run (two limits), kept on the page with the heading and the introduction. */
const TABLE_START = 110;

type Sensitivity = NonNullable<CaseResult['sensitivity']>;

interface RunOutcome {
  words: string;
  rows: Row[];
  computed: boolean;
  passes: boolean;
}

function signed(value: number | null | undefined): string {
  const text = fixed(value);
  return text === '-' || (value ?? 0) < 0 ? text : `+${text}`;
}

function runOutcome(words: string, levels: number[] | null, changes: (number | null)[], extent: number | null, limits: LimitResult[], error: string | null): RunOutcome {
  if (levels === null) return { words, computed: false, passes: false, rows: [{ colour: FAIL, cells: [words, '-', '-', '-', '-', '-', `cannot be computed: ${error ?? 'no answer'}`] }] };
  const margins = limits.map((l, i) => l.maxLevel - l.freeboard - levels[i]);
  const passes = margins.every((m) => m >= 0);
  if (limits.length === 0) return { words, computed: true, passes, rows: [{ cells: [words, 'no limits', '-', '-', '-', fixed(extent, 0), '-'] }] };
  const rows = limits.map((l, i) => ({
    colour: margins[i] >= 0 ? INK : FAIL,
    cells: [i === 0 ? words : '', l.label, fixed(levels[i]), signed(changes[i]), signed(margins[i]), i === 0 ? fixed(extent, 0) : '', margins[i] >= 0 ? 'met' : 'NOT MET'],
  }));
  return { words, computed: true, passes, rows };
}

function outcomes(s: Sensitivity, limits: LimitResult[]): RunOutcome[] {
  const base = runOutcome('As designed', s.base.levelsAtLimits, s.base.levelsAtLimits.map(() => 0), s.base.extent, limits, null);
  const label = (words: string) => words.charAt(0).toUpperCase() + words.slice(1).replace(/ is /, ' ');
  return [base, ...s.cases.map((c) => runOutcome(label(runWords(c.label, s.percentages)), c.result?.levelsAtLimits ?? null, c.levelChanges ?? [], c.result?.extent ?? null, limits, c.error))];
}

/**
 * The robustness of the pass in words: the engine's own statement when the result carries one; for results stored
 * before the engine reported it, what the sensitivity rows themselves show (a hook until those revisions are re-run).
 */
export function robustnessWords(results: CaseResult, runs: RunOutcome[] | null): string {
  if (results.robustness) {
    const r = results.robustness;
    if (r.status === 'robust') return 'The pass is robust: every limit keeps at least the minimum margin, and every sensitivity run passes.';
    if (r.status === 'fail') return 'The check fails as designed, so the pass has no robustness to report.';
    return `The check passes, but not robustly: ${r.reasons.join('; ')}.`;
  }
  if (!runs) return 'Robustness not reported: the revision was evaluated by an engine version that did not report it, and no sensitivity runs were asked for.';
  const failing = runs.filter((r) => !r.passes).map((r) => r.words);
  return failing.length === 0 ? 'Derived from the sensitivity runs above: every run meets every limit.' : `Derived from the sensitivity runs above: not every limit is met in these runs: ${failing.join('; ')}.`;
}

/** Under its heading, the sensitivity runs of the governing event, limit by limit, then the robustness of the pass. */
export function drawSensitivity(doc: Doc, results: CaseResult, datum: string | null): void {
  const s = results.sensitivity;
  const L = lengthUnit(results.units);
  if (!s) {
    heading(doc, HEADING);
    paragraph(doc, 'No sensitivity runs were asked for in this case.');
    paragraph(doc, robustnessWords(results, null));
    return;
  }
  const limits = results.events.find((e) => e.name === s.event)?.limits ?? [];
  const runs = outcomes(s, limits);
  const routed = s.cases.some((c) => c.label.startsWith('storage-') || c.label.startsWith('volume-'));
  const routedRuns = routed ? `, the reservoir's storage ${s.percentages.storage ?? ROUTED_SENSITIVITY_DEFAULTS.storage} % larger and smaller, and the flood's volume ${s.percentages.hydrographVolume ?? ROUTED_SENSITIVITY_DEFAULTS.hydrographVolume} % larger and smaller` : '';
  const introduction = `Event ${s.event}, run again with Manning's n ${s.percentages.manningN} % higher and lower, the discharge ${s.percentages.discharge} % higher, and the weir coefficient ${s.percentages.coefficient} % higher and lower${routedRuns}. The margin is the room left below the maximum level less its freeboard.`;
  heading(doc, HEADING, doc.font('sans').fontSize(9).heightOfString(pdfText(introduction), { width: contentWidth(doc), lineGap: 1.5 }) + TABLE_START);
  paragraph(doc, introduction);
  table(
    doc,
    [
      { title: 'Run', width: 90 },
      { title: 'Flood-level limit', width: 110 },
      { title: `Water level (${levelUnit(L, datum)})`, width: 64, align: 'right', mono: true },
      { title: `Change (${L})`, width: 48, align: 'right', mono: true },
      { title: `Margin (${L})`, width: 48, align: 'right', mono: true },
      { title: `Extent of impact (${L})`, width: 52, align: 'right', mono: true },
      { title: 'Outcome', width: 60 },
    ],
    runs.flatMap((r) => r.rows),
  );
  paragraph(doc, robustnessWords(results, runs));
}
