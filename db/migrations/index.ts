import * as initialSchema from './0001-initial-schema';
import * as frozenRevisions from './0002-frozen-revisions';

// Every migration, in order. Listed explicitly so that tsx, vitest and any bundler load them the same way.
export const MIGRATIONS = [
  { name: '0001-initial-schema', ...initialSchema },
  { name: '0002-frozen-revisions', ...frozenRevisions },
];
