import 'server-only';
import { type MailMessage, sendMail } from '@/lib/mail/send-mail';

/**
 * Sends notifications after the change has committed. A mail failure must not undo a submission or a
 * countersignature that is already recorded, so it is logged and reported back as "not notified" instead.
 */
export async function notifyAfterCommit(messages: MailMessage[]): Promise<{ sent: number; failed: number }> {
  let sent = 0;
  let failed = 0;
  for (const message of messages) {
    try {
      await sendMail(message);
      sent += 1;
    } catch (error) {
      failed += 1;
      console.error(`Could not send the notification "${message.subject}" to ${message.to}`, error);
    }
  }
  return { sent, failed };
}
