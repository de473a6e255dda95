// @vitest-environment jsdom
import { cleanup, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';

vi.mock('next/navigation', () => ({ useRouter: () => ({ push: () => undefined, refresh: () => undefined }) }));
// The server's answer to a wrong password, as confirmPassword words it (src/lib/auth/confirm-password.ts).
vi.mock('@/app/(portal)/checks/[id]/actions', () => ({
  countersignRevisionAction: async () => ({ ok: false, status: 400, error: 'The password did not match.', issues: [{ path: 'password', message: 'That is not your password. Countersigning needs the password you sign in with.' }] }),
}));

const { CountersignForm } = await import('@/app/(portal)/checks/[id]/countersign-form');

afterEach(cleanup);

describe('countersigning with a wrong password', () => {
  it('says so once, at the password field', async () => {
    render(<CountersignForm revisionId="r1" blocked={false} />);
    const user = userEvent.setup();
    await user.click(screen.getByLabelText(/I have checked this revision independently/));
    await user.type(screen.getByLabelText('Your password'), 'not-the-password');
    await user.click(screen.getByRole('button', { name: 'Countersign' }));
    const alerts = await screen.findAllByRole('alert');
    expect(alerts.map((a) => a.textContent)).toEqual(['That is not your password. Countersigning needs the password you sign in with.']);
    expect(screen.queryByText('The password did not match.')).toBeNull();
    expect(screen.getByLabelText('Your password').getAttribute('aria-invalid')).toBe('true');
  });
});
