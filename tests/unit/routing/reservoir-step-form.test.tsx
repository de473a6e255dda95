// @vitest-environment jsdom
import { cleanup, render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { setupServer } from 'msw/node';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { ReservoirStepForm } from '@/components/forms/wizard/reservoir/reservoir-step-form';

const navigation = vi.hoisted(() => ({ pushed: [] as string[] }));
vi.mock('next/navigation', () => ({ useRouter: () => ({ push: (href: string) => navigation.pushed.push(href), refresh: () => undefined }) }));

const saved: unknown[] = [];
const previews: string[] = [];
let previewAnswer: { status: number; body: unknown };
const server = setupServer(
  http.put('*/api/revisions/r1', async ({ request }) => {
    saved.push(await request.json());
    return HttpResponse.json({ revisionId: 'r1', step: 'reservoir', nextStep: 'limits', changed: [] });
  }),
  http.post('*/api/uploads/routing-csv-preview', ({ request }) => {
    previews.push(new URL(request.url).search);
    return HttpResponse.json(previewAnswer.body as Record<string, unknown>, { status: previewAnswer.status });
  }),
);

beforeAll(() => server.listen({ onUnhandledRequest: 'error' }));
afterEach(() => {
  cleanup();
  saved.length = 0;
  previews.length = 0;
  navigation.pushed.length = 0;
});
afterAll(() => server.close());

const EVENTS = [{ name: '50% AEP', discharge: 14, climateChangeAllowance: null }, { name: '1% AEP', discharge: 38, climateChangeAllowance: 20 }];
const form = (defaults = { hydrographs: [null, null] }) => render(<ReservoirStepForm schemeId="s1" revisionId="r1" units="SI" datum="Wendle Valley local datum" events={EVENTS} crestLevel={32.4} defaults={defaults} backHref="/back" />);
const csvFile = (text: string) => new File([text], 'inflow.csv', { type: 'text/csv' });

describe('the reservoir and inflow step', () => {
  it('saves no reservoir and no hydrographs when routing is left off', async () => {
    form();
    await userEvent.setup().click(screen.getByRole('button', { name: 'Save and continue' }));
    await waitFor(() => expect(saved).toEqual([{ step: 'reservoir', values: { hydrographs: [null, null] } }]));
    expect(navigation.pushed).toEqual(['/schemes/s1/wizard/limits']);
  });

  it('fills the storage and a hydrograph from CSV files, takes a shape for the other event, and saves them as the case file holds them', async () => {
    form();
    const user = userEvent.setup();
    await user.click(screen.getByLabelText('Route the design floods through a reservoir behind the structure'));
    expect(screen.getByText('Blank: the crest level, 32.400 m above Wendle Valley local datum.')).toBeTruthy();
    previewAnswer = { status: 200, body: { table: 'storage', kind: 'level-volume', rows: [{ level: 32.4, volume: 0 }, { level: 33.4, volume: 72000 }] } };
    await user.upload(document.getElementById('storage-level-area-csv') as HTMLInputElement, csvFile('level,volume\n32.4,0\n33.4,72000\n'));
    // A file of volumes turns the area table into a volume table.
    await screen.findByText('Stored volume by level: 2 rows');
    const [first, second] = screen.getAllByLabelText('Inflow hydrograph');
    await user.selectOptions(first, 'table');
    previewAnswer = { status: 400, body: { error: 'The hydrograph has 1 problem; the table on the page is unchanged.', issues: [{ path: 'line 3', message: 'discharge "nine" is not a number (inflow, m³/s)' }] } };
    await user.upload(document.getElementById('inflow-0-csv') as HTMLInputElement, csvFile('time,discharge\n0,3\n2,nine\n'));
    expect((await screen.findByTestId('inflow-0-csv-errors')).textContent).toContain('Line 3: discharge "nine" is not a number (inflow, m³/s)');
    previewAnswer = { status: 200, body: { table: 'hydrograph', rows: [{ time: 0, discharge: 3 }, { time: 2, discharge: 9 }, { time: 6, discharge: 4 }] } };
    await user.upload(document.getElementById('inflow-0-csv') as HTMLInputElement, csvFile('time,discharge\n0,3\n2,9\n6,4\n'));
    await screen.findByText('Inflow hydrograph of 50% AEP: 3 rows');
    await user.selectOptions(second, 'unit-shape');
    expect(screen.getByText('The NRCS dimensionless unit hydrograph, scaled to peak at the design discharge: 38 m³/s plus its 20 % climate-change allowance.')).toBeTruthy();
    await user.type(screen.getByLabelText('Time to peak (hours)'), '5');
    await user.type(screen.getByLabelText('Length of the reservoir along the valley (m)'), '400');
    await user.click(screen.getByRole('button', { name: 'Save and continue' }));
    await waitFor(() => expect(saved).toHaveLength(1));
    expect(saved[0]).toEqual({
      step: 'reservoir',
      values: {
        reservoir: { storage: { kind: 'level-volume', rows: [{ level: 32.4, volume: 0 }, { level: 33.4, volume: 72000 }] }, length: 400 },
        hydrographs: [{ kind: 'table', points: [{ time: 0, discharge: 3 }, { time: 2, discharge: 9 }, { time: 6, discharge: 4 }] }, { kind: 'unit-shape', shape: 'nrcs-dimensionless', timeToPeak: 5 }],
      },
    });
    expect(previews).toEqual(['?revision=r1&table=storage', '?revision=r1&table=hydrograph', '?revision=r1&table=hydrograph']);
  });

  it('refuses a typed row in words at its own cell before asking the server', async () => {
    form();
    const user = userEvent.setup();
    await user.click(screen.getByLabelText('Route the design floods through a reservoir behind the structure'));
    await user.selectOptions(screen.getAllByLabelText('Inflow hydrograph')[0], 'table');
    for (let i = 0; i < 3; i++) await user.click(screen.getAllByRole('button', { name: '+ Add a row' })[1]);
    await user.type(screen.getByLabelText('Time (hours from the start), row 1'), '0');
    await user.type(screen.getByLabelText('Discharge (m³/s), row 1'), '3');
    await user.type(screen.getByLabelText('Time (hours from the start), row 2'), 'two');
    await user.click(screen.getByRole('button', { name: 'Save and continue' }));
    const time = screen.getByLabelText('Time (hours from the start), row 2');
    await waitFor(() => expect(time.getAttribute('aria-invalid')).toBe('true'));
    expect(document.getElementById(`${time.id}-error`)?.textContent).toMatch(/^Row 2: the time must be a number/);
    expect(saved).toEqual([]);
  });
});
