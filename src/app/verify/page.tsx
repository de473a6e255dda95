import type { Metadata } from 'next';
import Link from 'next/link';
import { getCurrentSession } from '@/lib/auth/current-session';
import { lookupCertificate } from '@/lib/certificates/lookup-certificate';
import { verifyNumberSchema } from '@/lib/validation/certificate-schemas';
import { CautionNote } from '@/components/ui/caution-note';
import { FormField, buttonClassName, inputClassName } from '@/components/ui/form-field';
import { PageHeader } from '@/components/ui/page-header';
import { StatusIcon } from '@/components/ui/status-icon';
import { CertificateStatusCard } from './certificate-status-card';
import { VerifyUploadForm } from './verify-upload-form';

export const metadata: Metadata = { title: 'Verify a certificate' };

// Public: anyone may look a certificate number up. Checking an uploaded PDF needs an account (see the route handler).
export default async function VerifyPage({ searchParams }: { searchParams: Promise<{ number?: string | string[] }> }) {
  const { number: raw } = await searchParams;
  const typed = Array.isArray(raw) ? raw[0] : raw;
  const parsed = typed === undefined ? null : verifyNumberSchema.safeParse({ number: typed });
  const numberError = parsed && !parsed.success ? parsed.error.issues[0]?.message : undefined;
  const certificate = parsed?.success ? await lookupCertificate({ number: parsed.data.number }) : null;
  const { user } = await getCurrentSession();
  return (
    <>
      <PageHeader eyebrow="Verification" title="Verify a Sillmark certificate">Enter the number printed on a certificate to see whether it was issued by this portal and whether it still stands.</PageHeader>
      <section aria-labelledby="h-number" className="mb-10">
        <h2 id="h-number" className="mb-3 text-lg font-semibold">By certificate number</h2>
        <form method="get" action="/verify" className="flex max-w-xl flex-wrap items-end gap-3">
          <div className="flex-1">
            <FormField id="number" label="Certificate number" hint="For example SMC-2026-0001." error={numberError}>
              <input id="number" name="number" defaultValue={typed ?? ''} className={`${inputClassName} num`} aria-invalid={!!numberError} aria-describedby={numberError ? 'number-error' : 'number-hint'} />
            </FormField>
          </div>
          <div className="mb-4"><button type="submit" className={buttonClassName}>Look up</button></div>
        </form>
        {parsed?.success ? (certificate ? <CertificateStatusCard certificate={certificate} /> : <p role="status" className="rounded border-l-4 border-verdict-fail bg-white/70 px-4 py-3 font-semibold text-verdict-fail"><StatusIcon name="fail" className="mr-1" />No certificate numbered <span className="num">{parsed.data.number}</span> was issued by this portal.</p>) : null}
      </section>
      <section aria-labelledby="h-upload" className="mb-10">
        <h2 id="h-upload" className="mb-3 text-lg font-semibold">By checking the PDF file</h2>
        {user ? <VerifyUploadForm /> : <p className="text-sm"><Link className="text-accent underline" href="/sign-in?next=/verify">Sign in</Link> to upload a certificate PDF and check its digital signature and that it is the file issued.</p>}
        <p className="mt-4 text-sm text-ink-soft">To check the signature with your own tools, download the portal’s <a className="text-accent underline" href="/api/signing-certificate">signing certificate</a> (PEM).</p>
      </section>
      <CautionNote />
    </>
  );
}
