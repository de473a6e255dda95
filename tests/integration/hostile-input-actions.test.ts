import path from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { dotted, garbageJsonText, mutatedJsonText } from '../support/hostile-json';
import { ACTION_ACCESS } from './support/access-matrix';
import { expectRefusal, withoutChange } from './support/hostile-checks';
import { ACTION_TARGETS } from './support/hostile-targets';
import { usePortalWorld } from './support/portal-world';
import { signedInAs } from './support/session-double';

// Every server action, called as the role allowed to call it with random and hostile values (what a forged
// request could make React deserialise: Maps, Dates, BigInts, sparse arrays, null prototypes, deep nesting):
// each is refused with 400 and field paths, never a 500, and nothing is stored.

const RUNS = 30;
const APP = path.resolve('src/app');
const portal = usePortalWorld();


type Action = (raw: unknown) => Promise<{ ok: boolean; status?: number; error?: string; issues?: unknown }>;

async function action(folder: string, name: string): Promise<Action> {
  return ((await import(path.join(APP, folder, 'actions.ts'))) as Record<string, Action>)[name];
}

const isObject = (value: unknown) => typeof value === 'object' && value !== null && !Array.isArray(value);
const parsedOrText = (text: string): unknown => {
  try {
    return JSON.parse(text);
  } catch {
    return text;
  }
};

/** Values no form sends; for an action whose every field has a default, only values that are not objects at all. */
const garbageValue = (objects: boolean) =>
  fc
    .oneof(
      garbageJsonText({ objects }).map(parsedOrText),
      fc.anything({ maxDepth: 3, withBigInt: true, withDate: true, withMap: true, withSet: true, withTypedArray: true, withSparseArray: true, withNullPrototype: true, withBoxedValues: true, withObjectString: true }),
      fc.constantFrom<unknown>(undefined, Symbol('x'), () => ({ ok: true }), new Error('boom'), Number.NaN, Number.POSITIVE_INFINITY, -0, 2n ** 70n),
    )
    .filter((value) => objects || !isObject(value));

for (const [folder, actions] of Object.entries(ACTION_ACCESS)) {
  for (const name of Object.keys(actions)) {
    const target = ACTION_TARGETS[`${folder} ${name}`];
    describe(`${folder} ${name}`, () => {
      const signIn = () => signedInAs(target.role === 'anonymous' ? null : portal.world.people[target.role].sessionUser);

      it('refuses garbage with 400 and field paths, changing nothing', async () => {
        const run = await action(folder, name);
        await fc.assert(
          fc.asyncProperty(garbageValue(!target.objectsAreValid), async (raw) => {
            signIn();
            const answer = await withoutChange(() => run(raw));
            expect(answer.ok).toBe(false);
            expectRefusal({ status: answer.status ?? 0, error: answer.error, issues: answer.issues }, { label: `${name} ${String(typeof raw)}` });
          }),
          { numRuns: RUNS },
        );
      });

      it('refuses a field of the wrong type, a huge number or a deep nest with 400 naming that field', async () => {
        const run = await action(folder, name);
        await fc.assert(
          fc.asyncProperty(mutatedJsonText(target.valid(portal.world)), async ({ path: at, text }) => {
            signIn();
            const answer = await withoutChange(() => run(JSON.parse(text)));
            expect(answer.ok).toBe(false);
            expectRefusal({ status: answer.status ?? 0, error: answer.error, issues: answer.issues }, { label: `${name} at ${dotted(at)}`, field: dotted(at) });
          }),
          { numRuns: RUNS },
        );
      });
    });
  }
}
