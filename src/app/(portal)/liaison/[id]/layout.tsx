import type { ReactNode } from 'react';
import { schemeRevocations } from '@/lib/certificates/revision-revocation';
import { PageHeader } from '@/components/ui/page-header';
import { RevocationNotice } from '@/components/ui/revocation-notice';
import { LiaisonTabs } from '../_components/liaison-tabs';
import { requireLiaisonPage } from '../_components/scheme-page-access';

export default async function SchemeLiaisonLayout({ children, params }: { children: ReactNode; params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { scheme, access } = await requireLiaisonPage(id, `/liaison/${id}`);
  return (
    <>
      <PageHeader eyebrow={`Landowner liaison · ${scheme.reference}`} title={scheme.name}>
        {scheme.watercourse} at {scheme.site}.{' '}
        {access === 'read' ? 'You can read this scheme’s parcels and letters; only a landowner liaison officer can change or send them.' : null}
      </PageHeader>
      <RevocationNotice className="mb-6" revocations={await schemeRevocations(scheme.id)} />
      <LiaisonTabs schemeId={scheme.id} manage={access === 'manage'} />
      {children}
    </>
  );
}
