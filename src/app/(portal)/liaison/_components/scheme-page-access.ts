import 'server-only';
import { notFound } from 'next/navigation';
import { requirePageRole } from '@/lib/auth/page-guard';
import { NotFoundError } from '@/lib/http/app-errors';
import { LIAISON_READERS } from '@/lib/parcels/liaison-roles';
import { requireSchemeLiaisonAccess } from '@/lib/parcels/scheme-liaison-access';

/** For the liaison pages: the role first (403 page), then the scheme itself (404 page for one the user may not see). */
export async function requireLiaisonPage(schemeId: string, path: string) {
  const user = await requirePageRole(LIAISON_READERS, path);
  try {
    const { scheme, access } = await requireSchemeLiaisonAccess({ user, schemeId });
    return { user, scheme, access };
  } catch (error) {
    if (error instanceof NotFoundError) notFound();
    throw error;
  }
}

/** Runs a loader that checks access itself, turning its 404 into the not-found page. */
export async function orNotFound<T>(load: () => Promise<T>): Promise<T> {
  try {
    return await load();
  } catch (error) {
    if (error instanceof NotFoundError) notFound();
    throw error;
  }
}
