import 'server-only';
import type { Sequelize } from 'sequelize';
import { initAuditEvent } from './models/audit-event';
import { initCertificate } from './models/certificate';
import { initInvitation } from './models/invitation';
import { initLetter } from './models/letter';
import { initOutboundMessage } from './models/outbound-message';
import { initOutboxMessage } from './models/outbox-message';
import { initParcel } from './models/parcel';
import { initParcelPlan } from './models/parcel-plan';
import { initReview } from './models/review';
import { initRevision } from './models/revision';
import { initScheme } from './models/scheme';
import { initSignInAttempt } from './models/sign-in-attempt';
import { initUpload } from './models/upload';
import { initUser } from './models/user';
import { getSequelize } from './sequelize';

const initialised = new WeakSet<Sequelize>();

/** The shared Sequelize instance with every model bound to it. */
export function database(): Sequelize {
  const sequelize = getSequelize();
  if (!initialised.has(sequelize)) {
    for (const init of [initUser, initInvitation, initScheme, initRevision, initReview, initCertificate, initUpload, initParcel, initParcelPlan, initLetter, initOutboxMessage, initOutboundMessage, initAuditEvent, initSignInAttempt]) {
      init(sequelize);
    }
    initialised.add(sequelize);
  }
  return sequelize;
}

export { closeSequelize } from './sequelize';
export { AuditEvent } from './models/audit-event';
export { Certificate } from './models/certificate';
export { Invitation } from './models/invitation';
export { Letter, LetterBatch, LetterReminder, LetterResponse, LetterResponseEdit, LetterTemplate } from './models/letter';
export { OutboundMessage } from './models/outbound-message';
export { OutboxMessage } from './models/outbox-message';
export { Parcel, ParcelRegister } from './models/parcel';
export { ParcelPlan } from './models/parcel-plan';
export { Review, ReviewComment } from './models/review';
export { Revision } from './models/revision';
export { Scheme } from './models/scheme';
export { SignInAttempt } from './models/sign-in-attempt';
export { Upload } from './models/upload';
export { User } from './models/user';
