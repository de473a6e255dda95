'use server';

import { revalidatePath } from 'next/cache';
import { authorizedAction } from '@/lib/actions/authorized-action';
import { portalBaseUrl } from '@/lib/certificates/portal-base-url';
import { revokeCertificate } from '@/lib/certificates/revoke-certificate';
import { revokeCertificateSchema } from '@/lib/validation/certificate-schemas';

export const revokeCertificateAction = authorizedAction({ roles: ['admin'], schema: revokeCertificateSchema }, async (input, admin) => {
  const result = await revokeCertificate({ input, admin, baseUrl: await portalBaseUrl() });
  // The revocation shows on every page made from the revision: the scheme's, its results and the liaison pages.
  revalidatePath('/', 'layout');
  return result;
});
