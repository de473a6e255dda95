// Runs one use case in a process of its own, as the server would, over DATABASE_PATH. With `stopAt` it halts dead at a
// named point (printing `STOPPED <point>`) so that the parent can SIGKILL it exactly there. The points are Sequelize
// hooks and a wrapped `deliver` added from here, so production code carries no test hooks.
// Run: node --conditions=react-server --import tsx tests/integration/support/fault-child.ts '<job JSON>'
import type { Transaction } from 'sequelize';
import type { SessionUser } from '@/lib/auth/current-session';
import { Certificate, LetterBatch, Revision, database } from '@/lib/db';
import { generateLetters } from '@/lib/letters/generate-letters';
import { sendLetterBatch } from '@/lib/letters/send-letter-batch';
import { deliverOutboundMail } from '@/lib/mail/deliver-outbound-mail';
import { sendMail } from '@/lib/mail/send-mail';
import { countersignRevision } from '@/lib/review/countersign-revision';
import type { FaultJob } from './fault-job';

/** Says where it stopped and then waits forever: only the parent's SIGKILL ends the process. */
async function stop(point: string): Promise<never> {
  process.stdout.write(`STOPPED ${point}\n`);
  setInterval(() => undefined, 60_000);
  return new Promise<never>(() => undefined);
}

function countersignStops(stopAt: string | undefined): void {
  // Inside the transaction: the revision is marked countersigned, the PDF is not yet made.
  if (stopAt === 'revision-updated') Revision.addHook('afterUpdate', 'fault', async (revision: Revision) => (revision.status === 'countersigned' ? stop(stopAt) : undefined));
  // Inside the transaction: the signed PDF is on disk and its row inserted, nothing committed.
  if (stopAt === 'certificate-stored') Certificate.addHook('afterCreate', 'fault', async () => stop(stopAt));
  // Just after COMMIT, before the designer is told by e-mail.
  if (stopAt === 'committed') Certificate.addHook('afterCreate', 'fault', async (_row: Certificate, options: { transaction?: Transaction | null }) => options.transaction?.afterCommit(() => stop(stopAt)));
}

async function run(job: FaultJob): Promise<unknown> {
  database();
  if (job.use === 'countersign') {
    countersignStops(job.stopAt);
    return countersignRevision({ input: { revisionId: job.revisionId, password: job.password, confirmed: true }, checker: job.checker as SessionUser, baseUrl: 'http://localhost:3000' });
  }
  if (job.use === 'deliver-mail') {
    // What a restarted server's deliverer does at start-up; `clockAheadMs` stands for the time that has passed since.
    const ahead = job.clockAheadMs ?? 0;
    return deliverOutboundMail({
      now: () => Date.now() + ahead,
      send: async (message) => {
        const sent = await sendMail(message);
        // The mail server has accepted (and stored) the message; its "delivered" is not yet recorded.
        if (job.stopAt === 'after-send') await stop('after-send');
        return sent;
      },
    });
  }
  if (job.use === 'generate-letters') {
    // Inside the recording transaction, after every letter's PDF has been written.
    if (job.stopAt === 'batch-recorded') LetterBatch.addHook('afterCreate', 'fault', async () => stop('batch-recorded'));
    return generateLetters({ user: job.user as SessionUser, input: { schemeId: job.schemeId, revisionId: job.revisionId }, baseUrl: 'http://localhost:3000' });
  }
  let delivered = 0;
  const stopAt = job.stopAt;
  return sendLetterBatch({
    user: job.user as SessionUser,
    batchId: job.batchId,
    input: { max: job.max, retryFailed: false },
    deliver: async (message) => {
      const nth = delivered + 1;
      // The letter is claimed ("sending") and the message not yet handed to the mail server.
      if (stopAt?.point === 'before-delivery' && stopAt.letter === nth) await stop(`before-delivery ${nth}`);
      const sent = await sendMail(message);
      delivered = nth;
      // The mail server has accepted (and stored) the message; the letter's outcome is not yet recorded.
      if (stopAt?.point === 'after-delivery' && stopAt.letter === nth) await stop(`after-delivery ${nth}`);
      return sent;
    },
  });
}

const job = JSON.parse(process.argv[2] ?? '{}') as FaultJob;
run(job).then(
  (result) => {
    process.stdout.write(`RESULT ${JSON.stringify(result)}\n`);
    process.exit(0);
  },
  (error: Error & { status?: number }) => {
    process.stdout.write(`ERROR ${JSON.stringify({ name: error.name, message: error.message, status: error.status ?? null })}\n`);
    process.exit(1);
  },
);
