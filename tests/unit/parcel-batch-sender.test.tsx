// @vitest-environment jsdom
import { cleanup, render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { setupServer } from 'msw/node';
import { SWRConfig } from 'swr';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import type { BatchProgress } from '@/lib/letters/batch-progress';
import { emptyLetterCounts } from '@/lib/letters/letter-statuses';
import { BatchSender } from '@/app/(portal)/liaison/[id]/letters/batch-sender';

vi.mock('next/navigation', () => ({ useRouter: () => ({ refresh: () => undefined }) }));
vi.mock('@/app/(portal)/liaison/[id]/letters/actions', () => ({ withdrawBatchAction: vi.fn(), resendLetterAction: vi.fn(), markPostedAction: vi.fn() }));

const letters = ['HM-01', 'HM-02', 'HM-03', 'HM-04', 'HM-05'].map((ref, i) => ({ id: `l${i}`, parcelReference: ref, ownerName: `Owner ${i}`, recipientEmail: `owner${i}@wendle.test`, version: 1, status: 'queued' as const, failureReason: null, sentAt: null, postedOn: null, responseDueOn: null }));
let state: BatchProgress;
const requests: { max: number; retryFailed: boolean }[] = [];

function progress(): BatchProgress {
  const counts = emptyLetterCounts();
  for (const l of state.letters) counts[l.status] += 1;
  return { ...state, counts };
}

const server = setupServer(
  http.get('*/api/letters/batches/b1', () => HttpResponse.json(progress())),
  http.post('*/api/letters/batches/b1/send', async ({ request }) => {
    const body = (await request.json()) as { max: number; retryFailed: boolean };
    requests.push(body);
    // The third letter's recipient is refused by the mail server.
    state.letters.filter((l) => l.status === 'queued').slice(0, body.max).forEach((l) => Object.assign(l, l.parcelReference === 'HM-03' ? { status: 'failed', failureReason: 'The mail server refused or did not confirm it: mailbox unavailable' } : { status: 'sent' }));
    return HttpResponse.json(progress());
  }),
);

beforeAll(() => server.listen({ onUnhandledRequest: 'error' }));
afterEach(() => {
  cleanup();
  requests.length = 0;
});
afterAll(() => server.close());

function renderSender(manage: boolean) {
  state = { batchId: 'b1', schemeId: 's1', revisionNumber: 2, preliminary: false, status: 'open', createdAt: '2026-03-15T10:00:00.000Z', total: 5, counts: { ...emptyLetterCounts(), queued: 5 }, letters: letters.map((l) => ({ ...l })) };
  // A fresh SWR cache for each test.
  return render(<SWRConfig value={{ provider: () => new Map() }}><BatchSender batchId="b1" manage={manage} initiallyOpen /></SWRConfig>);
}

describe('sending a batch of letters', () => {
  it('sends in chunks until none is queued, showing the progress and each failure’s reason', async () => {
    renderSender(true);
    expect((await screen.findByTestId('batch-progress')).textContent).toBe('0 of 5 sent, 0 failed, 5 waiting.');
    await userEvent.click(screen.getByRole('button', { name: 'Send 5 letters' }));
    // Nothing goes until the count is confirmed.
    expect(requests).toEqual([]);
    expect(screen.getByText(/Send 5 letters by e-mail now\?/)).toBeTruthy();
    await userEvent.click(screen.getByRole('button', { name: 'Yes, e-mail 5 letters' }));
    await waitFor(() => expect(screen.getByTestId('batch-progress').textContent).toBe('4 of 5 sent, 1 failed, 0 waiting.'));
    expect(requests).toEqual([{ max: 3, retryFailed: false }, { max: 3, retryFailed: false }]);
    expect(screen.getByText(/mailbox unavailable/)).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Retry the failed letters' })).toBeTruthy();
    expect(screen.queryByRole('button', { name: /Send/ })).toBeNull();
  });

  it('sends nothing when the confirmation is cancelled, and offers to withdraw a batch nothing of which has gone out', async () => {
    renderSender(true);
    await userEvent.click(await screen.findByRole('button', { name: 'Send 5 letters' }));
    await userEvent.click(screen.getByRole('button', { name: 'Cancel' }));
    expect(requests).toEqual([]);
    expect(screen.queryByText(/by e-mail now\?/)).toBeNull();
    await userEvent.click(screen.getByRole('button', { name: 'Withdraw this batch' }));
    expect(screen.getByText(/Withdraw this batch of 5 letters\? None has gone out/)).toBeTruthy();
  });

  it('offers no sending to someone who may only read', async () => {
    renderSender(false);
    expect((await screen.findByTestId('batch-progress')).textContent).toBe('0 of 5 sent, 0 failed, 5 waiting.');
    expect(screen.queryAllByRole('button')).toHaveLength(0);
    expect(screen.getAllByText('Queued')).toHaveLength(5);
  });
});
