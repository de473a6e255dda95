// What the parent asks fault-child.ts to run, and where it may stop dead. Users travel as plain JSON.

interface JobUser {
  id: string;
  email: string;
  name: string;
  role: string;
  status: string;
}

export type CountersignStop = 'revision-updated' | 'certificate-stored' | 'committed';

export type FaultJob =
  | { use: 'countersign'; revisionId: string; checker: JobUser; password: string; stopAt?: CountersignStop }
  | { use: 'generate-letters'; user: JobUser; schemeId: string; revisionId: string; stopAt?: 'batch-recorded' }
  | { use: 'deliver-mail'; clockAheadMs?: number; stopAt?: 'after-send' }
  | { use: 'send-batch'; user: JobUser; batchId: string; max: number; stopAt?: { point: 'before-delivery' | 'after-delivery'; letter: number } };
