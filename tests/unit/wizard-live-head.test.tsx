// @vitest-environment jsdom
import { cleanup, render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { setupServer } from 'msw/node';
import { SWRConfig } from 'swr';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { StructureStepForm } from '@/components/forms/wizard/structure-step-form';

vi.mock('next/navigation', () => ({ useRouter: () => ({ push: () => undefined, refresh: () => undefined }) }));

type PreviewBody = { revisionId: string; control: { sillHeight?: number; crestLength?: number } };
const asked: PreviewBody[] = [];

// Stands in for the engine on the server: a head that grows with the crest length given, a depth of sill + head.
const server = setupServer(
  http.post('*/api/head-preview', async ({ request }) => {
    const body = (await request.json()) as PreviewBody;
    asked.push(body);
    const { sillHeight, crestLength } = body.control;
    if (crestLength === undefined) return HttpResponse.json({ error: 'Some fields need attention.', issues: [{ path: 'control.crestLength', message: 'Proposed structure: crest length is required' }] }, { status: 400 });
    const head = 10 / crestLength;
    const weir = { kind: 'broad-crested', sillHeight, head, energyHead: head, approachVelocity: 0.4, coefficient: 0.95, coefficientSource: 'Published source (test)', coefficientIsDefault: true, coefficientForm: { symbol: 'Cd', equation: 'Q = Cd·(2/3)·√((2/3)·g)·b·H^1.5', unit: 'dimensionless' }, tailwaterDepth: null, submergence: null, validity: [], designHead: null };
    return HttpResponse.json({ units: 'SI', events: [{ name: '1% AEP', discharge: 38, head, controlDepth: (sillHeight ?? 0) + head, controlLevel: 31.2 + (sillHeight ?? 0) + head, structureDepth: (sillHeight ?? 0) + head, criticalDepth: 1.1, normalDepth: 2.7, causesBackwater: true, explanation: null, weir }] });
  }),
);

beforeAll(() => server.listen({ onUnhandledRequest: 'error' }));
afterEach(() => {
  cleanup();
  asked.length = 0;
});
afterAll(() => server.close());

function renderForm() {
  return render(
    <SWRConfig value={{ provider: () => new Map(), dedupingInterval: 0 }}>
      <StructureStepForm schemeId="s1" revisionId="r1" units="SI" backHref="/back" defaults={{ control: { kind: 'broad-crested', sillHeight: 1.2, crestBreadth: 4, approachVelocity: true } }} />
    </SWRConfig>,
  );
}

describe('the live head over the crest and control depth', () => {
  it('waits for the blank fields, naming them in words and asking nothing of the server, then follows the values as they are typed', async () => {
    renderForm();
    expect((await screen.findByTestId('preview-waiting')).textContent).toBe('Worked out once you give the crest length.');
    expect(screen.getByTestId('head-preview').textContent).not.toMatch(/Not worked out yet|required|control\./);
    await new Promise((resolve) => setTimeout(resolve, 600));
    expect(asked).toEqual([]);

    const user = userEvent.setup();
    await user.type(screen.getByLabelText('Crest length (m)'), '10');
    await waitFor(() => expect(screen.getByTestId('preview-head').textContent).toBe('1.000 m'));
    expect(screen.getByTestId('preview-control-depth').textContent).toBe('2.200 m');
    expect(asked.at(-1)).toMatchObject({ revisionId: 'r1', control: { type: 'weir', kind: 'broad-crested', crestLength: 10, sillHeight: 1.2 } });

    const sill = screen.getByLabelText('Sill height (m)');
    await user.clear(sill);
    await user.type(sill, '1.6');
    await waitFor(() => expect(screen.getByTestId('preview-control-depth').textContent).toBe('2.600 m'));
    expect(screen.getByTestId('head-preview').textContent).toContain('Published source (test)');
  });

  it('names every blank field at once, the sill height and the crest length alike', async () => {
    render(
      <SWRConfig value={{ provider: () => new Map(), dedupingInterval: 0 }}>
        <StructureStepForm schemeId="s1" revisionId="r1" units="SI" backHref="/back" />
      </SWRConfig>,
    );
    expect((await screen.findByTestId('preview-waiting')).textContent).toBe('Worked out once you give the sill height and the crest length.');
    expect(asked).toEqual([]);
  });
});
