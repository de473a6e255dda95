import * as initialSchema from './0001-initial-schema';
import * as lettersHeld from './0003-letters-held';

// Every migration, in order. Listed explicitly so that tsx, vitest and any bundler load them the same way.
export const MIGRATIONS = [
  { name: '0001-initial-schema', ...initialSchema },
  { name: '0003-letters-held', ...lettersHeld },
];
