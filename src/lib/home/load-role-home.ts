import 'server-only';
import { Op, type WhereOptions } from 'sequelize';
import { AUDIT_ACTIONS } from '@/lib/audit/audit-actions';
import type { SessionUser } from '@/lib/auth/current-session';
import { AuditEvent, Certificate, Invitation, Letter, Revision, Scheme, User, database } from '@/lib/db';
import { longDate } from '@/lib/dates/calendar-dates';
import { portalDate, portalTime } from '@/lib/dates/portal-time';
import { type FollowUpLetter, listFollowUp } from '@/lib/letters/list-follow-up';

// The trail's words for a kind of event; a code it has no words for is shown as plain words, never as the code.
const auditActionLabel = (action: string) => (action in AUDIT_ACTIONS ? AUDIT_ACTIONS[action as keyof typeof AUDIT_ACTIONS] : action.replace(/[.-]/g, ' '));

export interface HomeItem {
  id: string;
  title: string;
  detail: string;
  status: string;
  /** Where the item's work is done, if it has a page of its own. */
  href?: string;
  /** The link serves a file (a signed PDF): a plain link, never prefetched, so that only a person's click downloads it. */
  download?: boolean;
}

export interface RoleHome {
  sections: { heading: string; empty: string; items: HomeItem[] }[];
}

async function revisionItems(where: WhereOptions<Revision>, excludeAuthor?: string, hrefOf: (revisionId: string, schemeId: string) => string = (id) => `/revisions/${id}`): Promise<HomeItem[]> {
  const revisions = await Revision.findAll({ where: excludeAuthor ? { [Op.and]: [where, { authorId: { [Op.ne]: excludeAuthor } }] } : where, order: [['updatedAt', 'DESC']], limit: 20 });
  const schemes = new Map((await Scheme.findAll({ where: { id: revisions.map((r) => r.schemeId) } })).map((s) => [s.id, s]));
  return revisions.map((r) => {
    const scheme = schemes.get(r.schemeId);
    return { id: r.id, title: `${scheme?.reference ?? ''} ${scheme?.name ?? 'Scheme'} — revision ${r.number}`, detail: `${scheme?.watercourse ?? ''} at ${scheme?.site ?? ''}`, status: r.status, href: hrefOf(r.id, r.schemeId) };
  });
}

/** What is waiting for the signed-in user, by role. */
export async function loadRoleHome(user: SessionUser): Promise<RoleHome> {
  database();
  switch (user.role) {
    case 'designer': {
      const mine = (await Scheme.findAll({ where: { designerId: user.id }, attributes: ['id'] })).map((s) => s.id);
      return {
        sections: [
          { heading: 'Drafts and returned revisions', empty: 'No drafts. Start a scheme from the Schemes page.', items: await revisionItems({ schemeId: mine, status: ['draft', 'returned'] }, undefined, (_id, schemeId) => `/schemes/${schemeId}`) },
          { heading: 'Waiting for check', empty: 'Nothing is with a checker.', items: await revisionItems({ schemeId: mine, status: 'submitted' }) },
        ],
      };
    }
    case 'checker':
      return { sections: [{ heading: 'Checks to do', empty: 'No revision is waiting for your check.', items: await revisionItems({ status: 'submitted', [Op.or]: [{ checkerId: user.id }, { checkerId: null }] }, user.id, (id) => `/checks/${id}`) }] };
    case 'liaison': {
      const queued = await Letter.count({ where: { status: ['queued', 'failed', 'to-post'] } });
      const followUp = await listFollowUp();
      const item = (f: FollowUpLetter): HomeItem => ({ id: f.letterId, title: `${f.schemeReference} ${f.parcelReference}: ${f.ownerName}`, detail: `Response due ${longDate(f.dueOn)}. Open the letter to log a response or make a reminder.`, status: f.standing === 'overdue' ? 'overdue' : 'due soon', href: `/liaison/${f.schemeId}/letters/${f.letterId}` });
      return {
        sections: [
          { heading: 'Letters overdue for a response', empty: 'No letter is past its response deadline.', items: followUp.filter((f) => f.standing === 'overdue').map(item) },
          { heading: 'Responses due within a week', empty: 'No response is due within a week.', items: followUp.filter((f) => f.standing === 'due-soon').map(item) },
          { heading: 'Certified revisions with landowners to inform', empty: 'No certified revision yet.', items: await revisionItems({ status: 'countersigned' }, undefined, (_id, schemeId) => `/liaison/${schemeId}`) },
          { heading: 'Letters to send', empty: 'No letter is waiting to be sent.', items: queued ? [{ id: 'queued', title: `${queued} letter(s) queued, failed or to post`, detail: 'Open the scheme’s letters to send or post them.', status: 'queued' }] : [] },
        ],
      };
    }
    case 'planning': {
      const certificates = await Certificate.findAll({ order: [['issuedAt', 'DESC']], limit: 20 });
      return { sections: [{ heading: 'Certificates to download', empty: 'No certificate has been issued yet.', items: certificates.map((c) => ({ id: c.id, title: c.number, detail: `Issued ${portalDate(c.issuedAt)}`, status: c.status, href: `/api/certificates/${c.id}/pdf`, download: true })) }] };
    }
    case 'admin': {
      const invitations = await Invitation.findAll({ where: { acceptedAt: null, cancelledAt: null }, order: [['createdAt', 'DESC']], limit: 20 });
      const events = await AuditEvent.findAll({ order: [['id', 'DESC']], limit: 8 });
      return {
        sections: [
          { heading: 'Invitations not yet accepted', empty: 'Every invited user has accepted.', items: invitations.map((i) => ({ id: i.id, title: i.email, detail: `Invited as ${i.role}, expires ${portalTime(i.expiresAt)}`, status: 'invited' })) },
          { heading: `Recent audit events (${await User.count()} users)`, empty: 'No audit events yet.', items: events.map((e) => ({ id: String(e.id), title: auditActionLabel(e.action), detail: portalTime(e.at), status: e.entityType })) },
        ],
      };
    }
  }
}
