import path from 'node:path';

// Calls the wizard's route handlers as the browser does, so tests read like the journey they check.
const APP = path.resolve('src/app/api');

type Handler = (request: Request, context: { params: Promise<Record<string, string>> }) => Promise<Response>;

async function handler(route: string, method: string): Promise<Handler> {
  const module = (await import(path.join(APP, route, 'route.ts'))) as Record<string, Handler>;
  return module[method];
}

export async function callRoute(route: string, method: string, options: { id?: string; query?: string; json?: unknown; body?: BodyInit; headers?: Record<string, string> } = {}): Promise<Response> {
  const run = await handler(route, method);
  const url = `http://localhost/api/${route.replace('[id]', options.id ?? 'none')}${options.query ? `?${options.query}` : ''}`;
  const body = options.json !== undefined ? JSON.stringify(options.json) : options.body;
  const headers = { ...(options.json !== undefined ? { 'content-type': 'application/json' } : {}), ...options.headers };
  const init: RequestInit & { duplex?: 'half' } = { method, body, headers, ...(body instanceof ReadableStream ? { duplex: 'half' } : {}) };
  return run(new Request(url, init), { params: Promise.resolve({ id: options.id ?? 'none' }) });
}

export const SCHEME_STEP = {
  name: 'Harrowfield Mill weir renewal (test)',
  watercourse: 'River Wendle',
  site: 'Harrowfield Mill, Wendle Valley',
  description: 'Invented test scheme',
  datum: 'Wendle Valley local datum',
  units: 'SI',
  bedLevelAtControl: 31.2,
  reachLength: 6000,
} as const;

export const CHANNEL_STEP = { section: { shape: 'trapezoidal', bottomWidth: 10, sideSlope: 2 }, manningN: 0.035, bedSlope: 0.0006 } as const;

export const FLOWS_STEP = {
  events: [
    { name: '50% AEP', discharge: 14, annualExceedanceProbability: 0.5 },
    { name: '1% AEP', discharge: 38, annualExceedanceProbability: 0.01, climateChangeAllowance: 20 },
  ],
  governing: 1,
} as const;

export const STRUCTURE_STEP = { control: { type: 'weir', kind: 'broad-crested', crestLength: 10, sillHeight: 1.2, crestBreadth: 4, noseShape: 'round-nosed', approachVelocity: true } } as const;

/** The demo reservoir behind the crest (32.4 m): invented storage, and an invented inflow for the first event only. */
export const RESERVOIR_STEP = {
  reservoir: {
    storage: { kind: 'level-area', rows: [{ level: 32.4, area: 60000 }, { level: 33.4, area: 85000 }, { level: 34.4, area: 120000 }, { level: 35.4, area: 160000 }] },
    length: 400,
  },
  hydrographs: [{ kind: 'table', points: [{ time: 0, discharge: 3 }, { time: 2, discharge: 9 }, { time: 4, discharge: 14 }, { time: 8, discharge: 9 }, { time: 12, discharge: 5 }, { time: 18, discharge: 3 }] }, null],
} as const;

export const LIMITS_STEP = {
  bankHeight: 3.2,
  impactThreshold: 0.01,
  limits: [
    { label: 'Harrowfield Mill cottages, door threshold', distanceUpstream: 300, maxLevel: 35.6, freeboard: 0.3 },
    { label: 'Mill Lane bridge soffit', distanceUpstream: 850, maxLevel: 35.9, freeboard: 0.6 },
  ],
  sizing: { vary: 'sillHeight', increment: 0.05, min: 0.2, max: 3 },
  sensitivity: { manningN: 20, discharge: 20, coefficient: 10 },
} as const;

/** Creates a scheme through the API and fills every wizard step; returns the draft's id. */
export async function completedDraft(): Promise<{ schemeId: string; revisionId: string }> {
  const created = await callRoute('schemes', 'POST', { json: SCHEME_STEP });
  if (created.status !== 201) throw new Error(`create failed: ${created.status} ${await created.text()}`);
  const { schemeId, revisionId } = (await created.json()) as { schemeId: string; revisionId: string };
  for (const [step, values] of [['channel', CHANNEL_STEP], ['flows', FLOWS_STEP], ['structure', STRUCTURE_STEP], ['limits', LIMITS_STEP]] as const) {
    const saved = await callRoute('revisions/[id]', 'PUT', { id: revisionId, json: { step, values } });
    if (saved.status !== 200) throw new Error(`${step} failed: ${saved.status} ${await saved.text()}`);
  }
  return { schemeId, revisionId };
}
