'use server';

import { revalidatePath } from 'next/cache';
import { authorizedAction } from '@/lib/actions/authorized-action';
import { revokeCertificate } from '@/lib/certificates/revoke-certificate';
import { revokeCertificateSchema } from '@/lib/validation/certificate-schemas';

export const revokeCertificateAction = authorizedAction({ roles: ['admin'], schema: revokeCertificateSchema }, async (input, admin) => {
  const result = await revokeCertificate({ input, admin });
  revalidatePath('/admin/certificates');
  revalidatePath('/certificates');
  return result;
});
