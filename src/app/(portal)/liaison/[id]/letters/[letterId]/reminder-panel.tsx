'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import type { LetterDetail } from '@/lib/letters/load-letter';
import { longDate } from '@/lib/dates/calendar-dates';
import { buttonClassName } from '@/components/ui/form-field';
import { LocalTime } from '@/components/ui/local-time';
import { StatusIcon } from '@/components/ui/status-icon';
import { makeReminderAction } from './actions';

/** The letter's deadline, its reminders (a postal one opens as a PDF to print), and making one for an unanswered letter. */
export function ReminderPanel({ detail, manage }: { detail: LetterDetail; manage: boolean }) {
  const router = useRouter();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const { letter, standing, reminders } = detail;
  const make = async () => {
    const result = await makeReminderAction({ letterId: letter.id });
    setMessage(result.ok ? { ok: true, text: `Reminder made ${result.data.channel === 'email' ? 'and e-mailed' : 'to post'}; the response is now due ${longDate(result.data.respondBy)}.` } : { ok: false, text: result.error });
    router.refresh();
  };
  return (
    <section aria-labelledby="follow-up-heading" className="mt-8">
      <h2 id="follow-up-heading" className="text-lg font-semibold">Follow-up</h2>
      <p className="mt-1 text-sm" data-testid="letter-deadline">
        {letter.responseDueOn ? <>Response due <span className="num">{longDate(letter.responseDueOn)}</span>{standing === 'overdue' ? <strong className="ml-2 text-verdict-fail">Overdue</strong> : standing === 'due-soon' ? <strong className="ml-2 text-verdict-caution">Due soon</strong> : standing === 'answered' ? <span className="ml-2 text-verdict-pass">Answered</span> : null}</> : 'No response deadline.'}
      </p>
      {reminders.length > 0 ? (
        <ul className="mt-2 space-y-1 text-sm">
          {reminders.map((r) => <li key={r.id}>Reminder {r.channel === 'email' ? 'e-mailed' : 'to post'} <LocalTime iso={r.createdAt} /> by {r.madeBy}{r.channel === 'post' ? <> · <a className="text-accent underline" href={`/api/letters/reminders/${r.id}`} target="_blank" rel="noreferrer">Print the reminder</a></> : null}</li>)}
        </ul>
      ) : null}
      {message ? <p role={message.ok ? 'status' : 'alert'} className={`mt-2 text-sm ${message.ok ? 'text-verdict-pass' : 'text-verdict-fail'}`}><StatusIcon name={message.ok ? 'pass' : 'fail'} className="mr-1" />{message.text}</p> : null}
      {manage && letter.canRemind ? <button type="button" className={`${buttonClassName} mt-3`} onClick={make}>{letter.recipientEmail && letter.status === 'sent' ? 'E-mail a reminder' : 'Make a reminder letter to post'}</button> : null}
    </section>
  );
}
