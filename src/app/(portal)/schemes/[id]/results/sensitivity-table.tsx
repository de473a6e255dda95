import type { CaseResult } from '@/lib/hydraulics/case-result';
import { ROUTED_SENSITIVITY_DEFAULTS } from '@/lib/hydraulics/design/sensitivity';
import { StatusIcon } from '@/components/ui/status-icon';

const LABELS: Record<string, string> = {
  'manning-n-up': "Manning's n up",
  'manning-n-down': "Manning's n down",
  'discharge-up': 'Discharge up',
  'coefficient-up': 'Coefficient up',
  'coefficient-down': 'Coefficient down',
  'storage-up': 'Reservoir storage up',
  'storage-down': 'Reservoir storage down',
  'volume-up': 'Flood volume up',
  'volume-down': 'Flood volume down',
};

const signed = (x: number) => `${x >= 0 ? '+' : '−'}${Math.abs(x).toFixed(3)}`;

/** How much the level at each limit and the extent of impact move when one input is changed. */
export function SensitivityTable({ sensitivity, limits, lengthUnit: u }: { sensitivity: NonNullable<CaseResult['sensitivity']>; limits: string[]; lengthUnit: string }) {
  const p = { ...ROUTED_SENSITIVITY_DEFAULTS, ...sensitivity.percentages };
  const amount: Record<string, string> = { 'manning-n-up': `+${p.manningN} %`, 'manning-n-down': `−${p.manningN} %`, 'discharge-up': `+${p.discharge} %`, 'coefficient-up': `+${p.coefficient} %`, 'coefficient-down': `−${p.coefficient} %`, 'storage-up': `+${p.storage} %`, 'storage-down': `−${p.storage} %`, 'volume-up': `+${p.hydrographVolume} %`, 'volume-down': `−${p.hydrographVolume} %` };
  return (
    <div role="region" aria-label="Sensitivity table" tabIndex={0} className="scroll-cue relative overflow-x-auto">
      <table className="w-full border-collapse text-sm">
        <caption className="mb-2 text-left text-sm text-ink-soft">Event {sensitivity.event}. Change in water level at each limit, and in the extent of impact, against the base run ({u}).</caption>
        <thead>
          <tr className="border-b border-paper-edge text-left text-ink-soft">
            <th scope="col" className="py-1 pr-3">Changed input</th>
            {limits.map((l) => <th key={l} scope="col" className="py-1 pr-3 text-right">{l}</th>)}
            <th scope="col" className="py-1 text-right">Extent of impact</th>
          </tr>
        </thead>
        <tbody>
          {sensitivity.cases.map((c) => (
            <tr key={c.label} className="border-b border-paper-edge">
              <th scope="row" className="py-1 pr-3 text-left font-normal">{LABELS[c.label] ?? c.label} <span className="num">{amount[c.label]}</span></th>
              {c.levelChanges ? c.levelChanges.map((d, i) => <td key={i} className="num py-1 pr-3 text-right">{signed(d)}</td>) : <td colSpan={limits.length} className="py-1 pr-3 text-verdict-caution"><StatusIcon name="caution" className="mr-1" />not computed: {c.error}</td>}
              <td className="num py-1 text-right">{c.extentChange === null ? '—' : signed(c.extentChange)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
