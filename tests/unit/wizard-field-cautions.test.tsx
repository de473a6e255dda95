// @vitest-environment jsdom
import { cleanup, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { PrismaticChannelForm } from '@/components/forms/wizard/prismatic-channel-form';
import { SchemeStepForm } from '@/components/forms/wizard/scheme-step-form';

vi.mock('next/navigation', () => ({ useRouter: () => ({ push: () => undefined, refresh: () => undefined }) }));
vi.mock('react-chartjs-2', () => ({ Scatter: () => null }));

afterEach(cleanup);

const cautionOf = (input: HTMLElement) => {
  const id = input.getAttribute('aria-describedby')?.split(' ').find((part) => part.endsWith('-caution'));
  return id ? document.getElementById(id)?.textContent : undefined;
};

describe('fields that may be left blank or set unusually say so where they are typed', () => {
  it('says, once the bed level is left empty, that a prismatic channel needs it, and says nothing before', async () => {
    render(<SchemeStepForm defaults={{}} unitsLocked={false} target={{ create: async () => ({ ok: true, data: { schemeId: 's1' } }) }} />);
    const bed = screen.getByLabelText('Bed level at the structure (m)');
    expect(cautionOf(bed)).toBeUndefined();
    const user = userEvent.setup();
    await user.click(bed);
    await user.tab();
    expect(cautionOf(bed)).toBe('The bed level at the structure is empty: a prismatic channel needs it (a surveyed reach takes it from the survey).');
    await user.type(bed, '31.2');
    expect(cautionOf(bed)).toBeUndefined();
  });

  it('warns at the bed slope that a horizontal or adverse bed needs the depth without the scheme', async () => {
    render(<PrismaticChannelForm schemeId="s1" revisionId="r1" units="SI" backHref="/back" defaults={{ section: { shape: 'rectangular', width: 8 }, manningN: 0.035, bedSlope: 0.0006 }} />);
    const slope = screen.getByLabelText('Bed slope (m/m)');
    expect(cautionOf(slope)).toBeUndefined();
    const user = userEvent.setup();
    await user.clear(slope);
    await user.type(slope, '0');
    expect(cautionOf(slope)).toMatch(/^A horizontal bed has no normal depth: it is accepted only with the depth without the scheme/);
    await user.clear(slope);
    await user.type(slope, '-0.001');
    expect(cautionOf(slope)).toMatch(/^An adverse bed has no normal depth/);
  });
});
