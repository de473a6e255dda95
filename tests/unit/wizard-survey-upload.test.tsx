// @vitest-environment jsdom
import { cleanup, render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { setupServer } from 'msw/node';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { SurveyUpload } from '@/components/forms/wizard/survey-upload';

const navigation = vi.hoisted(() => ({ pushed: [] as string[] }));
vi.mock('next/navigation', () => ({ useRouter: () => ({ push: (href: string) => navigation.pushed.push(href), refresh: () => undefined }) }));
vi.mock('react-chartjs-2', () => ({ Scatter: ({ 'aria-label': label }: { 'aria-label': string }) => <div role="img" aria-label={label} /> }));

const calls: { url: string; body: string; name: string | null }[] = [];
const SECTIONS = [0, 400].map((d) => ({ distanceUpstream: d, points: [[0, 34], [10, 31], [20, 34]], manningN: 0.035, lines: d === 0 ? [2, 4] : [5, 7] }));
let preview: { status: number; body: unknown };

const server = setupServer(
  http.post('*/api/uploads/survey-preview', async ({ request }) => {
    calls.push({ url: request.url, body: await request.text(), name: request.headers.get('x-file-name') });
    return HttpResponse.json(preview.body as Record<string, unknown>, { status: preview.status });
  }),
  http.post('*/api/uploads/survey', async ({ request }) => {
    calls.push({ url: request.url, body: await request.text(), name: request.headers.get('x-file-name') });
    return HttpResponse.json({ revisionId: 'r1', uploadId: 'u1', sections: 2, rowCount: 6 }, { status: 201 });
  }),
);

beforeAll(() => server.listen({ onUnhandledRequest: 'error' }));
afterEach(() => {
  cleanup();
  calls.length = 0;
  navigation.pushed.length = 0;
});
afterAll(() => server.close());

const csv = (text: string, name = 'survey.csv') => new File([text], name, { type: 'text/csv' });

describe('the survey upload', () => {
  it('lists every bad line the server reports, and stores nothing', async () => {
    preview = {
      status: 400,
      body: {
        error: 'The survey has 3 problems; nothing was stored.',
        issues: [
          { path: 'line 3', message: 'elevation "thirty" is not a number (ground level, m above the datum)' },
          { path: 'line 6', message: 'distance_upstream 200 m comes after 400 m on line 5' },
          { path: 'file', message: 'has 1 cross-section; a surveyed reach needs at least two' },
        ],
      },
    };
    render(<SurveyUpload schemeId="s1" revisionId="r1" lengthUnit="m" current={null} />);
    await userEvent.setup().upload(screen.getByLabelText('Survey CSV file'), csv('distance_upstream,station,elevation,manning_n\n0,0,thirty,0.03\n', 'wendle & mill.csv'));
    const report = await screen.findByTestId('survey-errors');
    expect(report.getAttribute('role')).toBe('alert');
    expect(report.textContent).toContain('wendle & mill.csv: The survey has 3 problems; nothing was stored.');
    expect(within(report).getAllByRole('listitem').map((li) => li.textContent)).toEqual([
      'Line 3: elevation "thirty" is not a number (ground level, m above the datum)',
      'Line 6: distance_upstream 200 m comes after 400 m on line 5',
      'File: has 1 cross-section; a surveyed reach needs at least two',
    ]);
    expect(calls).toHaveLength(1);
    expect(calls[0].url).toMatch(/\/api\/uploads\/survey-preview\?revision=r1$/);
    expect(calls[0].name).toBe(encodeURIComponent('wendle & mill.csv'));
    expect(screen.queryByRole('button', { name: /Use this survey/ })).toBeNull();
  });

  it('refuses a 50 MB file at once, without sending it', async () => {
    const big = csv('distance_upstream,station,elevation,manning_n\n');
    Object.defineProperty(big, 'size', { value: 50 * 1024 * 1024 });
    render(<SurveyUpload schemeId="s1" revisionId="r1" lengthUnit="m" current={null} />);
    await userEvent.setup().upload(screen.getByLabelText('Survey CSV file'), big);
    expect((await screen.findByTestId('survey-errors')).textContent).toContain('The file is 50.0 MB; a survey CSV may be at most 2.0 MB. Nothing was stored.');
    expect(calls).toEqual([]);
  });

  it('previews a good survey as a table and plots, and stores it only when asked', async () => {
    preview = { status: 200, body: { sections: SECTIONS, rowCount: 6, units: 'SI' } };
    render(<SurveyUpload schemeId="s1" revisionId="r1" lengthUnit="m" current={null} />);
    const user = userEvent.setup();
    await user.upload(screen.getByLabelText('Survey CSV file'), csv('good'));
    expect((await screen.findByRole('status')).textContent).toContain('2 cross-sections, 6 points, no problems found');
    expect(within(screen.getByRole('table', { name: 'Cross-sections found in the file' })).getAllByRole('row')).toHaveLength(3);
    // Each plot has its numbers as a table too (its text alternative).
    expect(screen.getAllByRole('table', { name: /^The numbers in the cross-section/, hidden: true })).toHaveLength(2);
    expect(screen.getAllByRole('img').map((i) => i.getAttribute('aria-label'))).toEqual([expect.stringMatching(/^Section at 0 m upstream/), expect.stringMatching(/^Section at 400 m upstream/)]);
    expect(calls.map((c) => new URL(c.url).pathname)).toEqual(['/api/uploads/survey-preview']);
    await user.click(screen.getByRole('button', { name: 'Use this survey and continue' }));
    await vi.waitFor(() => expect(navigation.pushed).toEqual(['/schemes/s1/wizard/flows']));
    expect(calls.map((c) => new URL(c.url).pathname)).toEqual(['/api/uploads/survey-preview', '/api/uploads/survey']);
  });
});
