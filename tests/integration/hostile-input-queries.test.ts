import { describe, expect, it } from 'vitest';
import { ROUTE_ACCESS } from './support/access-matrix';
import { expectRefusal, refusalOf, withoutChange } from './support/hostile-checks';
import { QUERY_TARGETS } from './support/hostile-targets';
import { usePortalWorld } from './support/portal-world';
import { callRoute } from './support/scheme-requests';
import { signedInAs } from './support/session-double';

// Route handlers that read filters from their query: a bad filter is refused with 400 naming the field (never
// ignored, never a 500) and changes nothing stored; the valid query is answered.
const portal = usePortalWorld();

for (const [key, target] of Object.entries(QUERY_TARGETS)) {
  const [method, route] = key.split(' ');
  const call = (query: string) => {
    signedInAs(portal.world.people[target.role].sessionUser);
    return callRoute(route.replace(/^api\//, ''), method, { query, id: target.id?.(portal.world) });
  };

  describe(key, () => {
    it('is in the access matrix for the role it is called as', () => {
      const access = ROUTE_ACCESS[route]?.[method as 'GET'];
      expect(access === 'public' || access?.includes(portal.world.people[target.role].sessionUser.role)).toBe(true);
    });

    it('answers the valid query', async () => {
      expect((await call(target.valid(portal.world))).status).toBe(200);
    });

    for (const { query, field } of target.hostile) {
      it(`refuses ${query.slice(0, 60)} naming ${field}`, async () => {
        const refusal = await withoutChange(async () => refusalOf(await call(query)));
        expectRefusal(refusal, { field, label: `${key}?${query.slice(0, 60)}` });
      });
    }
  });
}
