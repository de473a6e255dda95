import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import type { EventResult } from '@/lib/hydraulics/case-result';
import { durationWords, eventRouting, fixedWithoutNegativeZero } from '@/lib/routing-sheet/event-routing';
import { routingTableCsv } from '@/lib/routing-sheet/routing-table-csv';
import { routingResultFixture } from '../../fixtures/routing/routing-result-fixture';

const routing = routingResultFixture();
const csv = (eventName = '100-year flood', datum: string | null = 'Ordnance Datum Newlyn') =>
  routingTableCsv({ scheme: { reference: 'WND-7', name: 'Harrowfield weir' }, revision: 3, eventName, routing, units: 'SI', datum, engineVersion: '9.9.9' });

describe('routing table CSV', () => {
  it('opens with a block naming the scheme, revision, event, units, datum and engine, then one row per step', () => {
    const rows = parse(csv(), { relax_column_count: true }) as string[][];
    const meta = Object.fromEntries(rows.slice(1, 8).map(([k, v]) => [k, v]));
    expect(meta).toMatchObject({ Scheme: 'WND-7 Harrowfield weir', Revision: '3', Event: '100-year flood', 'Level datum': 'Ordnance Datum Newlyn', 'Engine version': '9.9.9' });
    expect(meta.Units).toContain('times in hours');
    const header = rows.findIndex((r) => r[0] === 'Time (h)');
    expect(rows[header]).toEqual(['Time (h)', 'Inflow (m³/s)', 'Outflow (m³/s)', 'Reservoir level (m above Ordnance Datum Newlyn)', 'Storage above the start level (m³)']);
    const data = rows.slice(header + 1);
    expect(data).toHaveLength(routing.steps.length);
    // Seconds become hours: the step at 6 h (21 600 s) reads 6.
    const six = routing.steps.findIndex((s) => s.time === 6 * 3600);
    expect(Number(data[six][0])).toBe(6);
    expect(Number(data[six][1])).toBe(routing.steps[six].inflow);
  });

  it('writes a designer’s text that starts like a formula as text', () => {
    const rows = parse(csv('=HYPERLINK("x")', '+datum'), { relax_column_count: true }) as string[][];
    expect(rows.find((r) => r[0] === 'Event')?.[1]).toBe('\'=HYPERLINK("x")');
    expect(rows.find((r) => r[0] === 'Level datum')?.[1]).toBe("'+datum");
  });

  it('says when the datum was not named', () => {
    expect(csv('Flood', null)).toContain('the scheme datum (not named)');
  });
});

describe('event routing', () => {
  it('reads a result stored before routing existed (no field at all) as no routing', () => {
    expect(eventRouting({ name: 'old' } as EventResult)).toBeNull();
    expect(eventRouting({ name: 'new', routing } as unknown as EventResult)).toBe(routing);
  });

  it('gives a duration under an hour in minutes, so a short lag does not read as 0.00 h', () => {
    expect(durationWords(900)).toBe('15.0 min');
    expect(durationWords(2 * 3600)).toBe('2.00 h');
    expect(durationWords(0)).toBe('0.00 h');
  });

  it('writes a residual that rounds to zero without a minus', () => {
    expect(fixedWithoutNegativeZero(-0.04, 1)).toBe('0.0');
    expect(fixedWithoutNegativeZero(-0.06, 1)).toBe('-0.1');
    expect(fixedWithoutNegativeZero(-0, 0)).toBe('0');
  });
});
