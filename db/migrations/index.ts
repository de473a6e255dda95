import * as initialSchema from './0001-initial-schema';
import * as frozenRevisions from './0002-frozen-revisions';
import * as lettersHeld from './0003-letters-held';
import * as signInAttempts from './0004-sign-in-attempts';
import * as outboundMessages from './0005-outbound-messages';
import * as letterCasework from './0006-letter-casework';
import * as parcelPlans from './0007-parcel-plans';

// Every migration, in order. Listed explicitly so that tsx, vitest and any bundler load them the same way.
export const MIGRATIONS = [
  { name: '0001-initial-schema', ...initialSchema },
  { name: '0002-frozen-revisions', ...frozenRevisions },
  { name: '0003-letters-held', ...lettersHeld },
  { name: '0004-sign-in-attempts', ...signInAttempts },
  { name: '0005-outbound-messages', ...outboundMessages },
  { name: '0006-letter-casework', ...letterCasework },
  { name: '0007-parcel-plans', ...parcelPlans },
];
