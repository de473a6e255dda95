// @vitest-environment jsdom
import { cleanup, render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { setupServer } from 'msw/node';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { FlowsStepForm } from '@/components/forms/wizard/flows-step-form';
import { PrismaticChannelForm } from '@/components/forms/wizard/prismatic-channel-form';

const navigation = vi.hoisted(() => ({ pushed: [] as string[] }));
vi.mock('next/navigation', () => ({ useRouter: () => ({ push: (href: string) => navigation.pushed.push(href), refresh: () => undefined }) }));
vi.mock('react-chartjs-2', () => ({ Scatter: () => null }));

const saved: unknown[] = [];
let answer: { status: number; body: unknown } = { status: 200, body: {} };
const server = setupServer(
  http.put('*/api/revisions/r1', async ({ request }) => {
    saved.push(await request.json());
    return HttpResponse.json(answer.body as Record<string, unknown>, { status: answer.status });
  }),
);

beforeAll(() => server.listen({ onUnhandledRequest: 'error' }));
afterEach(() => {
  cleanup();
  saved.length = 0;
  navigation.pushed.length = 0;
});
afterAll(() => server.close());

describe('the server’s answer is shown at the field it names', () => {
  it('puts a refused channel dimension beside its input, in words with the unit, and stays on the step', async () => {
    answer = { status: 400, body: { error: 'Some fields need attention.', issues: [{ path: 'section.bottomWidth', message: 'must be greater than 0 m' }, { path: 'bedSlope', message: 'must be less than 1 m/m' }] } };
    render(<PrismaticChannelForm schemeId="s1" revisionId="r1" units="SI" backHref="/back" defaults={{ section: { shape: 'trapezoidal', bottomWidth: 10, sideSlope: 2 }, manningN: 0.035, bedSlope: 0.0006 }} />);
    await userEvent.setup().click(screen.getByRole('button', { name: 'Save and continue' }));
    const width = screen.getByLabelText('Bottom width (m)');
    await waitFor(() => expect(width.getAttribute('aria-invalid')).toBe('true'));
    const message = document.getElementById(width.getAttribute('aria-describedby')!.split(' ').find((id) => id.endsWith('-error'))!);
    expect(message?.textContent).toBe('Bottom width must be greater than 0 m');
    expect(message?.querySelector('svg[aria-hidden="true"]')).not.toBeNull();
    expect(screen.getByText('Bed slope must be less than 1 m/m')).toBeTruthy();
    expect(screen.getByText('Some fields need attention.')).toBeTruthy();
    expect(saved).toEqual([{ step: 'channel', values: { section: { shape: 'trapezoidal', bottomWidth: 10, sideSlope: 2 }, manningN: 0.035, bedSlope: 0.0006 } }]);
    expect(navigation.pushed).toEqual([]);
  });

  it('refuses text in a number before asking the server, and maps an event’s path to its own row', async () => {
    answer = { status: 400, body: { error: 'Some fields need attention.', issues: [{ path: 'events[1].discharge', message: 'must be greater than 0 m³/s' }] } };
    render(<FlowsStepForm schemeId="s1" revisionId="r1" units="SI" backHref="/back" defaults={{ events: [{ name: '50% AEP', discharge: 14 }, { name: '1% AEP', discharge: 38 }], governing: 1 }} />);
    const user = userEvent.setup();
    const [first, second] = screen.getAllByLabelText('Discharge (m³/s)');
    await user.clear(first);
    await user.type(first, 'fourteen');
    await user.click(screen.getByRole('button', { name: 'Save and continue' }));
    expect((await screen.findByText('Discharge must be a number (m³/s)')).closest('fieldset')?.querySelector('legend')?.textContent).toBe('Event 1');
    expect(saved).toEqual([]);

    await user.clear(first);
    await user.type(first, '14');
    await user.click(screen.getByRole('button', { name: 'Save and continue' }));
    expect((await screen.findByText('Discharge must be greater than 0 m³/s')).closest('fieldset')?.querySelector('legend')?.textContent).toBe('Event 2');
    expect(second.getAttribute('aria-invalid')).toBe('true');
    expect(saved).toHaveLength(1);
  });

  it('moves on to the next step when the server accepts the step', async () => {
    answer = { status: 200, body: { revisionId: 'r1', step: 'channel', nextStep: 'flows', changed: ['reach.manningN'] } };
    render(<PrismaticChannelForm schemeId="s1" revisionId="r1" units="US" backHref="/back" defaults={{ section: { shape: 'rectangular', width: 30 }, manningN: 0.03, bedSlope: 0.001 }} />);
    expect(screen.getByLabelText('Width (ft)')).toBeTruthy();
    await userEvent.setup().click(screen.getByRole('button', { name: 'Save and continue' }));
    await waitFor(() => expect(navigation.pushed).toEqual(['/schemes/s1/wizard/flows']));
  });
});
