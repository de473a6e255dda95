import 'server-only';
import type { Transaction } from 'sequelize';
import { Op } from 'sequelize';
import type { SessionUser } from '@/lib/auth/current-session';
import { type Certificate, type Revision, type Scheme, User } from '@/lib/db';
import type { MailMessage } from '@/lib/mail/send-mail';
import { utcDateTime } from '@/lib/pdf/certificate-text';
import { certificateVerificationUrl } from './certificate-urls';

interface Revoked {
  certificate: Certificate;
  revision: Revision;
  scheme: Scheme;
  admin: SessionUser;
  heldLetters: number;
  baseUrl: string;
}

/** Who is told of a revocation: the revision's designer and checker, and every active landowner liaison officer. */
async function recipients(revision: Revision, transaction: Transaction): Promise<User[]> {
  const people = await User.findAll({ where: { status: 'active', [Op.or]: [{ id: [revision.authorId, revision.checkerId].filter((id): id is string => !!id) }, { role: 'liaison' }] }, order: [['email', 'ASC']], transaction });
  return people.filter((p, i) => people.findIndex((q) => q.email.toLowerCase() === p.email.toLowerCase()) === i);
}

function text(person: User, o: Revoked): string {
  const { certificate, revision, scheme } = o;
  const letters = o.heldLetters === 0 ? 'No letter of this revision was waiting to be sent.' : `${o.heldLetters} letter(s) of this revision that were waiting to be sent are held and will not be sent.`;
  return [
    `Hello ${person.name},`,
    '',
    `${o.admin.name} revoked certificate ${certificate.number} on ${utcDateTime(certificate.revokedAt ?? '')}. It certified revision ${revision.number} of ${scheme.reference} ${scheme.name} (${scheme.watercourse} at ${scheme.site}).`,
    '',
    `Reason: ${certificate.revocationReason ?? ''}`,
    '',
    `Revision ${revision.number} is no longer certified: letters to landowners can no longer be made from it. ${letters}`,
    '',
    `The certificate's public verification page:\n${certificateVerificationUrl(o.baseUrl, certificate.number)}`,
    `The scheme:\n${o.baseUrl}/schemes/${scheme.id}`,
  ].join('\n');
}

/** One e-mail per person to tell; read inside the revoking transaction, sent after it commits. */
export async function revocationNotices(o: Revoked, transaction: Transaction): Promise<MailMessage[]> {
  const subject = `Sillmark: certificate ${o.certificate.number} for ${o.scheme.reference} revision ${o.revision.number} is revoked`;
  return (await recipients(o.revision, transaction)).map((person) => ({ to: person.email, subject, text: text(person, o) }));
}
