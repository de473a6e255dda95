import type { CaseResult } from '@/lib/hydraulics/case-result';
import type { CaseInput } from '@/lib/validation/case-schema';
import { fixed, lengthUnit } from './certificate-text';

const CHOW = 'Chow, V. T. (1959) Open-Channel Hydraulics. McGraw-Hill, New York';

/** The published methods the engine applied to this case, each with its source as the engine cites it. */
export function certificateMethods(inputs: CaseInput, results: CaseResult): string[] {
  const method = inputs.profile.method ?? (inputs.reach.kind === 'prismatic' ? 'direct-step' : 'standard-step');
  const lines = [
    'Uniform flow and friction slope: Manning\'s equation (Manning, R. (1891) On the flow of water in open channels and pipes. Transactions of the Institution of Civil Engineers of Ireland, 20).',
    `Critical depth: minimum specific energy, Froude number 1 (${CHOW}, ch. 3).`,
    `Classification of the water-surface profile by bed slope and depth (${CHOW}, ch. 9).`,
    method === 'direct-step'
      ? `Backwater profile: direct step method for a prismatic channel (${CHOW}, section 10-3).`
      : `Backwater profile: standard step method between surveyed cross-sections (${CHOW}, section 10-4).`,
  ];
  const sources = new Set<string>();
  for (const event of results.events) {
    const weir = event.control.weir;
    if (weir?.coefficientForm) sources.add(`${weir.coefficientSource}; ${weir.coefficientForm.symbol ? `${weir.coefficientForm.symbol} ${weir.coefficientForm.unit === 'dimensionless' ? 'dimensionless' : `in ${weir.coefficientForm.unit}`}, ` : ''}${weir.coefficientForm.equation}`);
    else if (weir) sources.add(weir.coefficientSource);
  }
  for (const source of sources) lines.push(`Weir discharge coefficient: ${source}.`);
  const relations = new Set(results.events.flatMap((e) => (e.control.weir?.submergence && !e.control.weir.submergence.modular ? [e.control.weir.submergence.relation ?? 'Villemonte (1947)'] : [])));
  for (const relation of relations) {
    lines.push(
      relation.startsWith('Villemonte')
        ? `Submerged structure, rated against the water downstream of it: ${relation} (Villemonte, J. R. (1947) Submerged-weir discharge studies. Engineering News-Record, 139).`
        : `Submerged structure, rated against the water downstream of it: ${relation} (Bos, M. G. (1989) Discharge Measurement Structures, 3rd ed. ILRI Publication 20, Wageningen).`,
    );
  }
  if (results.events.some((e) => e.extent?.sense === 'drawdown')) lines.push(`Drawdown upstream of a given depth below normal depth (M2 profile) reported as negative afflux (${CHOW}, ch. 9).`);
  if (results.events.some((e) => e.jump)) lines.push(`Hydraulic jump: the sequent-depth (Belanger) equation (${CHOW}, ch. 15).`);
  const selfCheck = results.events.find((e) => e.selfCheck)?.selfCheck;
  if (selfCheck) lines.push(`Independent self-check of each profile: ${selfCheck.method}.`);
  return lines;
}

/** What the result rests on, in words, from the frozen inputs. */
export function certificateAssumptions(inputs: CaseInput, results: CaseResult): string[] {
  const L = lengthUnit(results.units);
  const reach = inputs.reach;
  const lines = ['Steady, one-dimensional, gradually varied flow in a fixed-bed channel; each design flood is taken at its peak discharge.'];
  lines.push(reach.kind === 'prismatic' ? 'One cross-section and one roughness along the whole reach (a prismatic channel), as listed under The channel.' : 'The channel is represented by its surveyed cross-sections, summarised under The channel.');
  const without = results.events[0]?.withoutScheme.controlBy;
  lines.push(without === 'existing-control' ? 'Without the scheme, the level at the control is the existing control depth given in the case.' : 'Without the scheme, the flow at the control is at normal depth.');
  if (inputs.control.type === 'weir') {
    const reason = inputs.control.coefficientReason ? ` (${inputs.control.coefficientReason})` : '';
    lines.push(inputs.control.coefficient !== undefined ? `Weir coefficient ${inputs.control.coefficient} given by the designer${reason}.` : 'Weir coefficient from the published relation named under Methods.');
  } else {
    lines.push(`Control depth of ${inputs.control.depth} ${L} given by the designer.`);
  }
  lines.push(`A profile ends where the depth is within ${fixed(inputs.profile.normalDepthTolerance * 100, 1)} % of normal depth${inputs.impactThreshold !== undefined ? `; the impact ends where the afflux falls below ${inputs.impactThreshold} ${L}` : ''}.`);
  const allowances = inputs.events.filter((e) => e.climateChangeAllowance).map((e) => `${e.name} +${e.climateChangeAllowance} %`);
  if (allowances.length) lines.push(`Climate-change allowances on the design discharge: ${allowances.join(', ')}.`);
  return lines;
}
